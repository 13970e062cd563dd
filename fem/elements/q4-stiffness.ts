import { GAUSS_2, Q4Point } from './quad4';
import { fillStrainMatrix } from './strain-matrix';

/** Scratch arrays for q4Stiffness, reusable across elements of one assembly. */
export class Q4Workspace {
  readonly point = new Q4Point();
  readonly b = new Float64Array(32);
  readonly db = new Float64Array(32);
}

/**
 * Stiffness of one bilinear quad, k = ∫ Bᵀ D B dV with 2×2 Gauss integration, written to
 * `out` (8×8 row-major, N/m). Axisymmetric: dV = 2π r dA, so nodal forces are totals over the
 * whole ring; plane strain: dV = 1 m · dA (per metre of thickness). `d` from elasticD().
 */
export function q4Stiffness(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  d: Float64Array,
  axisymmetric: boolean,
  out: Float64Array,
  ws: Q4Workspace = new Q4Workspace(),
): void {
  const rows = axisymmetric ? 4 : 3;
  const { point: p, b, db } = ws;
  out.fill(0);
  for (const eta of GAUSS_2) {
    for (const xi of GAUSS_2) {
      p.evaluate(xr, xz, xi, eta);
      fillStrainMatrix(p, axisymmetric, b);
      const w = axisymmetric ? 2 * Math.PI * p.r * p.detJ : p.detJ;
      for (let i = 0; i < rows; i++) {
        for (let c = 0; c < 8; c++) {
          let s = 0;
          for (let k = 0; k < rows; k++) s += d[i * rows + k] * b[k * 8 + c];
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
  for (let r = 1; r < 8; r++) for (let c = 0; c < r; c++) out[r * 8 + c] = out[c * 8 + r];
}
