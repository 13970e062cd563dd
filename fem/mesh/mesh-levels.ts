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

/**
 * A refined band of rings: uniform chord spacing `spacing` from chord `lo` to chord `hi` from the
 * pole (unit body), grading back to the surrounding mesh on either side.
 */
export interface RefinedBand {
  lo: number;
  hi: number;
  spacing: number;
}

/**
 * A level's parameters graded to a contact: spacing `poleSpacing` out to chord `contactExtent`,
 * and an optional refined band (the pad's edge).
 */
export interface MeshPlan extends MeshLevelParams {
  contactExtent?: number;
  band?: RefinedBand | null;
}

/** Per-level grading targets (see mesh-plan.ts). */
export interface LevelGrading {
  /** surface nodes across the expected contact radius */
  nodesPerContact: number;
  /** band spacing at most the edge radius over this */
  edgeDivisions: number;
  /** band spacing at most the surrounding spacing over this */
  bandRefinement: number;
}

/** Pole spacing 0.02 / 0.01 / 0.005, growing geometrically in rings out to r ≈ 0.66. */
export const MESH_LEVEL_PARAMS: Record<MeshLevel, MeshLevelParams> = {
  sparse: { half: 6, poleSpacing: 0.02, ringOuter: 0.7 },
  balanced: { half: 12, poleSpacing: 0.01, ringOuter: 0.7 },
  dense: { half: 20, poleSpacing: 0.005, ringOuter: 0.7 },
};

/**
 * 8 / 16 / 32 nodes across the contact, as the pole spacings give a 0.16 R contact; the edge
 * band resolves the rounded edge with 12 / 24 / 48 spacings, which puts 3–10 nodes across the
 * pressure peak of a contact that reaches a quarter of the edge radius past the flat.
 */
export const LEVEL_GRADING: Record<MeshLevel, LevelGrading> = {
  sparse: { nodesPerContact: 8, edgeDivisions: 12, bandRefinement: 2 },
  balanced: { nodesPerContact: 16, edgeDivisions: 24, bandRefinement: 3 },
  dense: { nodesPerContact: 32, edgeDivisions: 48, bandRefinement: 5 },
};
