import type { StressSample } from '../types';
import type { ElasticSplit } from './elastic-d';
import { meanDilatation, Q4Workspace } from './q4-stiffness';
import { GAUSS_2, Q4Point } from './quad4';
import { fillStrainMatrix } from './strain-matrix';

/**
 * Stress (Pa) at natural point (ξ, η) of a bilinear quad from its element displacements
 * `ue` = [u_r0, u_z0, …] (m), consistent with the mean-dilatation stiffness (q4Stiffness):
 * σ = D_dev ε(ξ, η) + κ θ̄ m, θ̄ the element's mean dilatation. Axisymmetric: hoop stress in
 * `stt`; plane strain: the out-of-plane stress σ_zz = −(2μ/3)θ + κθ̄ in `stt` (= λθ when the
 * dilatation is uniform). Tension positive.
 */
export function q4Stress(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  ue: ArrayLike<number>,
  material: ElasticSplit,
  xi: number,
  eta: number,
  ws: Q4Workspace = new Q4Workspace(),
): StressSample {
  const { rows, dev, bulk, mu } = material;
  const axisymmetric = material.model === 'axisymmetric';
  const thetaBar = meanDilatation(xr, xz, ue, axisymmetric, ws);
  const p = new Q4Point().evaluate(xr, xz, xi, eta);
  const b = new Float64Array(rows * 8);
  fillStrainMatrix(p, axisymmetric, b);
  const eps = new Float64Array(rows);
  for (let i = 0; i < rows; i++) {
    let s = 0;
    for (let c = 0; c < 8; c++) s += b[i * 8 + c] * ue[c];
    eps[i] = s;
  }
  const sig = new Float64Array(rows);
  for (let i = 0; i < rows; i++) {
    let s = i < rows - 1 ? bulk * thetaBar : 0;
    for (let k = 0; k < rows; k++) s += dev[i * rows + k] * eps[k];
    sig[i] = s;
  }
  if (axisymmetric) return { r: p.r, z: p.z, srr: sig[0], szz: sig[1], stt: sig[2], srz: sig[3] };
  const outOfPlane = (-2 * mu * (eps[0] + eps[1])) / 3 + bulk * thetaBar;
  return { r: p.r, z: p.z, srr: sig[0], szz: sig[1], stt: outOfPlane, srz: sig[2] };
}

/**
 * The centroid stress of a quad per unit value of each element DOF, as the 4 × 8 row-major matrix
 * [srr, szz, stt, srz][DOF] (plane strain: stt the out-of-plane stress), consistent with q4Stress
 * at (0, 0): σ = D_dev B(0, 0) + κ m b̄ᵀ.
 */
export function q4CentroidStressMatrix(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  material: ElasticSplit,
  out: Float64Array,
  ws: Q4Workspace = new Q4Workspace(),
): void {
  const { rows, dev, bulk, mu } = material;
  const axisymmetric = material.model === 'axisymmetric';
  const { point: p, b, bbar } = ws;
  const nNormal = rows - 1;
  bbar.fill(0);
  let volume = 0;
  for (const eta of GAUSS_2) {
    for (const xi of GAUSS_2) {
      p.evaluate(xr, xz, xi, eta);
      fillStrainMatrix(p, axisymmetric, b);
      const w = axisymmetric ? 2 * Math.PI * p.r * p.detJ : p.detJ;
      volume += w;
      for (let c = 0; c < 8; c++) {
        for (let k = 0; k < nNormal; k++) bbar[c] += b[k * 8 + c] * w;
      }
    }
  }
  p.evaluate(xr, xz, 0, 0);
  fillStrainMatrix(p, axisymmetric, b);
  for (let c = 0; c < 8; c++) {
    const tb = bulk * (bbar[c] / volume);
    const sig = [0, 0, 0, 0];
    for (let i = 0; i < rows; i++) {
      let s = i < nNormal ? tb : 0;
      for (let k = 0; k < rows; k++) s += dev[i * rows + k] * b[k * 8 + c];
      sig[i] = s;
    }
    const theta = b[c] + b[8 + c];
    const stt = axisymmetric ? sig[2] : (-2 * mu * theta) / 3 + tb;
    const srz = axisymmetric ? sig[3] : sig[2];
    out[c] = sig[0];
    out[8 + c] = sig[1];
    out[16 + c] = stt;
    out[24 + c] = srz;
  }
}
