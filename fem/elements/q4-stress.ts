import type { StressSample } from '../types';
import { Q4Point } from './quad4';
import { fillStrainMatrix } from './strain-matrix';

/**
 * Stress (Pa) at natural point (ξ, η) of a bilinear quad from its element displacements
 * `ue` = [u_r0, u_z0, …] (m). Axisymmetric: hoop stress in `stt`; plane strain: the out-of-plane
 * stress σ_zz = λ(ε_xx + ε_yy) in `stt` (`lambda` = Lamé's λ, ignored for axisymmetric).
 * Tension positive.
 */
export function q4Stress(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  ue: ArrayLike<number>,
  d: Float64Array,
  axisymmetric: boolean,
  lambda: number,
  xi: number,
  eta: number,
): StressSample {
  const rows = axisymmetric ? 4 : 3;
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
    let s = 0;
    for (let k = 0; k < rows; k++) s += d[i * rows + k] * eps[k];
    sig[i] = s;
  }
  if (axisymmetric) return { r: p.r, z: p.z, srr: sig[0], szz: sig[1], stt: sig[2], srz: sig[3] };
  return { r: p.r, z: p.z, srr: sig[0], szz: sig[1], stt: lambda * (eps[0] + eps[1]), srz: sig[2] };
}
