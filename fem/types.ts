import type { Matrix } from 'ml-matrix';

/** The mesh refinement levels of the squeeze model, coarsest first. */
export const MESH_LEVELS = ['sparse', 'balanced', 'dense'] as const;

/** The levels' former names, refused with the new name (results saved before keep them). */
export const RENAMED_MESH_LEVELS: Readonly<Record<string, MeshLevel>> = {
  coarse: 'sparse',
  normal: 'balanced',
  fine: 'dense',
};

/** Mesh refinement level of the squeeze model. */
export type MeshLevel = (typeof MESH_LEVELS)[number];

/** The finite-element idealisations: a body of revolution, or a plane-strain slice. */
export const BODY_MODELS = ['axisymmetric', 'plane-strain'] as const;

/** Which finite-element idealisation: a body of revolution, or a plane-strain slice per unit thickness. */
export type BodyModel = (typeof BODY_MODELS)[number];

/**
 * A refined band of surface nodes around a pad's edge, as integers so that keys compare exactly:
 * uniform chord spacing h = 2^(spacing/2) (unit body) from chord 8h·lo to 8h·hi from the pole.
 */
export interface EdgeBand {
  spacing: number;
  lo: number;
  hi: number;
}

/** Key of a cached unit body: geometry is scaled to equatorial radius 1 m and modulus 1 Pa. */
export interface UnitBodyKey {
  model: BodyModel;
  /** axial radius / equatorial radius (1 = sphere or circular disc); axial = along the squeeze axis */
  aspect: number;
  /** Poisson's ratio, in [0, 0.5) */
  poisson: number;
  level: MeshLevel;
  /**
   * Contact-scale band k (integer ≤ 0): the surface spacing near the pole is graded to a contact
   * of radius 2^(k/4) (unit body). Omit for the level's standard spacing (0.02 / 0.01 / 0.005).
   */
  contactBand?: number;
  /** Refined band at a pad's edge; omit for none. */
  edgeBand?: EdgeBand;
}

/**
 * The unit body condensed onto the axial (squeeze-direction) DOFs of the candidate contact nodes
 * under one pad. Quarter meridional section: the mid-plane z = 0 is a symmetry plane (u_z = 0),
 * the axis r = 0 has u_r = 0 (axisymmetric) or is a symmetry line (plane strain). The pad presses
 * on the pole at z = aspect, moving in −z. Contact is frictionless: tangential DOFs of contact
 * nodes carry no load and are condensed out with the interior.
 *
 * Scaling to a real body of equatorial radius R (m) and modulus E (Pa):
 * axisymmetric K_real = E·R·K; plane strain (per metre of thickness) K_real = E·K.
 * Positions scale by R. Sign: u_z < 0 is toward the centre; a pad pushes with f_z < 0.
 */
export interface CondensedBody {
  key: UnitBodyKey;
  /** number of mesh nodes and DOFs of the full model (for reporting) */
  nodes: number;
  dofs: number;
  /** candidate contact nodes, ordered from the pole (r = 0) outward along the surface */
  contactR: Float64Array;
  contactZ: Float64Array;
  /** condensed stiffness on the contact nodes' axial DOFs, unit body (dense, symmetric positive definite) */
  K: Matrix;
  /** full nodal displacement vector (unit body) from the contact nodes' axial displacements, zero other loads */
  recover(uc: Float64Array): Float64Array;
  /**
   * Stresses at sampling points for a full displacement vector of the unit body with unit modulus
   * (multiply by E, and divide displacements by R first, for a real body).
   * Axisymmetric: hoop stress in `stt`; plane strain: out-of-plane stress in `stt`.
   */
  stresses(u: Float64Array): StressSample[];
}

/** Stress (Pa, tension positive) at a sampling point (r, z) in m of the meridional section. */
export interface StressSample {
  r: number;
  z: number;
  srr: number;
  szz: number;
  stt: number;
  srz: number;
}
