import { GAUSS_2, q4Jacobian } from '../../../fem/elements/quad4';
import type { QuadMesh } from '../../../fem/mesh/quad-mesh';

/** Worst-element figures of a quad mesh. */
export interface MeshQuality {
  /** smallest Jacobian determinant over all corners and 2×2 Gauss points (m² per natural area) */
  minDetJ: number;
  /** smallest corner sine (scaled Jacobian): 1 for rectangles, ≤ 0 for folded elements */
  minCornerSine: number;
  /** largest ratio of longest to shortest edge within an element */
  maxEdgeRatio: number;
}

/** Checks every element: Jacobians at corners and Gauss points, corner angles, edge ratios. */
export function meshQuality(mesh: QuadMesh): MeshQuality {
  const { nodeR, nodeZ, quads } = mesh;
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  let minDetJ = Infinity;
  let minCornerSine = Infinity;
  let maxEdgeRatio = 0;
  const points: [number, number][] = [
    [-1, -1],
    [1, -1],
    [1, 1],
    [-1, 1],
  ];
  for (const a of GAUSS_2) for (const b of GAUSS_2) points.push([a, b]);
  for (let e = 0; e < quads.length / 4; e++) {
    for (let a = 0; a < 4; a++) {
      xr[a] = nodeR[quads[4 * e + a]];
      xz[a] = nodeZ[quads[4 * e + a]];
    }
    for (const [xi, eta] of points) minDetJ = Math.min(minDetJ, q4Jacobian(xr, xz, xi, eta));
    let lo = Infinity;
    let hi = 0;
    for (let a = 0; a < 4; a++) {
      const b = (a + 1) % 4;
      const c = (a + 3) % 4;
      const ur = xr[b] - xr[a];
      const uz = xz[b] - xz[a];
      const vr = xr[c] - xr[a];
      const vz = xz[c] - xz[a];
      const lu = Math.hypot(ur, uz);
      minCornerSine = Math.min(minCornerSine, (ur * vz - uz * vr) / (lu * Math.hypot(vr, vz)));
      lo = Math.min(lo, lu);
      hi = Math.max(hi, lu);
    }
    maxEdgeRatio = Math.max(maxEdgeRatio, hi / lo);
  }
  return { minDetJ, minCornerSine, maxEdgeRatio };
}
