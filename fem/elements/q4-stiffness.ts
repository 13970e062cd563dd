import type { ElasticSplit } from './elastic-d';
import { GAUSS_2, Q4Point } from './quad4';
import { fillStrainMatrix } from './strain-matrix';

/** Scratch arrays for q4Stiffness, reusable across elements of one assembly. */
export class Q4Workspace {
  readonly point = new Q4Point();
  readonly b = new Float64Array(32);
  readonly db = new Float64Array(32);
  readonly bbar = new Float64Array(8);
}

/**
 * Stiffness of one bilinear quad with a mean-dilatation (B-bar) volumetric part, written to `out`
 * (8×8 row-major, N/m): k = ∫ Bᵀ D_dev B dV (2×2 Gauss) + κ V b̄ b̄ᵀ, where b̄ = (1/V) ∫ mᵀB dV is
 * the element's mean dilatation per DOF (Nagtegaal, Parks & Rice, Comput. Methods Appl. Mech.
 * Eng. 4 (1974) 153; Hughes, Int. J. Numer. Methods Eng. 15 (1980) 1413 [from memory]). One
 * volumetric constraint per element instead of four removes the volumetric locking of the fully
 * integrated quad as ν → 0.5; a linear field has a constant dilatation, so the patch test and
 * the rigid-body modes are those of the full element. Axisymmetric: dV = 2π r dA (whole-ring
 * forces); plane strain: dV = 1 m · dA (per metre).
 * Returns b̄ in `ws.bbar` and the volume V.
 */
export function q4Stiffness(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  material: ElasticSplit,
  out: Float64Array,
  ws: Q4Workspace = new Q4Workspace(),
): number {
  const { rows, dev } = material;
  const axisymmetric = material.model === 'axisymmetric';
  const nNormal = rows - 1;
  const { point: p, b, db, bbar } = ws;
  out.fill(0);
  bbar.fill(0);
  let volume = 0;
  for (const eta of GAUSS_2) {
    for (const xi of GAUSS_2) {
      p.evaluate(xr, xz, xi, eta);
      fillStrainMatrix(p, axisymmetric, b);
      const w = axisymmetric ? 2 * Math.PI * p.r * p.detJ : p.detJ;
      volume += w;
      for (let c = 0; c < 8; c++) {
        let theta = 0;
        for (let k = 0; k < nNormal; k++) theta += b[k * 8 + c];
        bbar[c] += theta * w;
        for (let i = 0; i < rows; i++) {
          let s = 0;
          for (let k = 0; k < rows; k++) s += dev[i * rows + k] * b[k * 8 + c];
          db[i * 8 + c] = s * w;
        }
      }
      for (let r = 0; r < 8; r++) {
        for (let c = r; c < 8; c++) {
          let s = 0;
          for (let k = 0; k < rows; k++) s += b[k * 8 + r] * db[k * 8 + c];
          out[r * 8 + c] += s;
        }
      }
    }
  }
  for (let c = 0; c < 8; c++) bbar[c] /= volume;
  const kv = material.bulk * volume;
  for (let r = 0; r < 8; r++) for (let c = r; c < 8; c++) out[r * 8 + c] += kv * bbar[r] * bbar[c];
  for (let r = 1; r < 8; r++) for (let c = 0; c < r; c++) out[r * 8 + c] = out[c * 8 + r];
  return volume;
}

/** The mean dilatation of an element, b̄ · u_e (see q4Stiffness), into `ws.bbar` and returned. */
export function meanDilatation(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  ue: ArrayLike<number>,
  axisymmetric: boolean,
  ws: Q4Workspace = new Q4Workspace(),
): number {
  const { point: p, b } = ws;
  const nNormal = axisymmetric ? 3 : 2;
  let volume = 0;
  let sum = 0;
  for (const eta of GAUSS_2) {
    for (const xi of GAUSS_2) {
      p.evaluate(xr, xz, xi, eta);
      fillStrainMatrix(p, axisymmetric, b);
      const w = axisymmetric ? 2 * Math.PI * p.r * p.detJ : p.detJ;
      volume += w;
      for (let c = 0; c < 8; c++) {
        let theta = 0;
        for (let k = 0; k < nNormal; k++) theta += b[k * 8 + c];
        sum += theta * ue[c] * w;
      }
    }
  }
  return sum / volume;
}
