import type { StressSample } from '../types';
import type { ElasticSplit } from './elastic-d';
import { meanDilatation, Q4Workspace } from './q4-stiffness';
import { Q4Point } from './quad4';
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
