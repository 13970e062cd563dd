import { GAUSS_2 } from '../../../fem/elements/quad4';

/**
 * Adds the consistent nodal forces (N) of a uniform pressure `p` (Pa, positive pushing into the
 * body) on the straight edge from node `a` to node `b` into `f` (layout [f_r0, f_z0, f_r1, …]).
 * Convention: the body lies to the right of the directed edge a → b, as for surface nodes listed
 * from the pole to the equator, so the outward normal is the left normal (−Δz, Δr)/L.
 * f_i = −p n ∫ N_i dS, with dS = 2π r ds (axisymmetric, whole ring) or 1 m · ds (plane strain);
 * 2-point Gauss is exact because N_i·r is quadratic along the edge.
 */
export function addEdgePressure(
  f: Float64Array,
  nodeR: ArrayLike<number>,
  nodeZ: ArrayLike<number>,
  a: number,
  b: number,
  p: number,
  axisymmetric: boolean,
): void {
  const dr = nodeR[b] - nodeR[a];
  const dz = nodeZ[b] - nodeZ[a];
  const len = Math.hypot(dr, dz);
  const nr = -dz / len;
  const nz = dr / len;
  for (const g of GAUSS_2) {
    const na = 0.5 * (1 - g);
    const nb = 0.5 * (1 + g);
    const r = na * nodeR[a] + nb * nodeR[b];
    const w = 0.5 * len * (axisymmetric ? 2 * Math.PI * r : 1);
    f[2 * a] -= p * nr * na * w;
    f[2 * a + 1] -= p * nz * na * w;
    f[2 * b] -= p * nr * nb * w;
    f[2 * b + 1] -= p * nz * nb * w;
  }
}
