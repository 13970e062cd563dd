import type { MeshLevel } from '../types';

/**
 * Grading parameters of the quarter-section mesh, in units of the equatorial radius.
 * `half` = half the number of element divisions across the rings around the pole; `poleSpacing` =
 * surface node spacing at the pole; the rings around the pole reach a chord `ringOuter` from it.
 */
export interface MeshLevelParams {
  half: number;
  poleSpacing: number;
  ringOuter: number;
}

/** Pole spacing 0.02 / 0.01 / 0.005, growing geometrically in rings out to r ≈ 0.66. */
export const MESH_LEVEL_PARAMS: Record<MeshLevel, MeshLevelParams> = {
  coarse: { half: 6, poleSpacing: 0.02, ringOuter: 0.7 },
  normal: { half: 12, poleSpacing: 0.01, ringOuter: 0.7 },
  fine: { half: 20, poleSpacing: 0.005, ringOuter: 0.7 },
};
