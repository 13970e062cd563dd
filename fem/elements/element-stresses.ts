import { elementCorners, type QuadMesh } from '../mesh/quad-mesh';
import type { BodyModel, StressSample } from '../types';
import { elasticSplit } from './elastic-d';
import { Q4Workspace } from './q4-stiffness';
import { q4Stress } from './q4-stress';

/**
 * Stress (Pa) at every element centroid for a full displacement vector `u` (m, layout
 * [u_r0, u_z0, …]); one sample per element, in element order. Centroids have r > 0, so the
 * axisymmetric hoop strain u_r/r is defined there.
 */
export function centroidStresses(
  mesh: QuadMesh,
  model: BodyModel,
  modulus: number,
  poisson: number,
  u: ArrayLike<number>,
): StressSample[] {
  const material = elasticSplit(model, modulus, poisson);
  const { quads } = mesh;
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  const ue = new Float64Array(8);
  const ws = new Q4Workspace();
  const out: StressSample[] = [];
  for (let e = 0; e < quads.length / 4; e++) {
    elementCorners(mesh, e, xr, xz);
    for (let a = 0; a < 4; a++) {
      const v = quads[4 * e + a];
      ue[2 * a] = u[2 * v];
      ue[2 * a + 1] = u[2 * v + 1];
    }
    out.push(q4Stress(xr, xz, ue, material, 0, 0, ws));
  }
  return out;
}
