/**
 * Stage 2 of the squeeze pipeline: the validated case (stage 1) bound to its cached condensed
 * unit body, in real units.
 */
import { getCondensedBody, type FemBody } from '../body/cache';
import { validateSqueezeInput, type SqueezeCase, type SqueezeInput } from './01-input';
import { padLift } from './pad';

/** A squeeze case on its condensed body: real node radii and initial gaps to the pad. */
export interface BodyStage {
  case: SqueezeCase;
  /** the shared unit body (equatorial radius 1 m, E = 1 Pa); do not mutate */
  body: FemBody;
  /** real radii of the contact nodes, m */
  r: Float64Array;
  /** initial axial gap between each node and the pad, m (Infinity beyond the pad) */
  gap: Float64Array;
  /** K_real = stiffnessScale · K_unit: E·R (axisymmetric) or E (plane strain, per metre) */
  stiffnessScale: number;
}

/**
 * Validates `input` and binds it to the cached unit body of its model, aspect, ν and mesh level
 * (built on first use). Throws FemInputError naming the field for bad input.
 */
export function prepareBody(input: SqueezeInput): BodyStage {
  const c = validateSqueezeInput(input);
  const body = getCondensedBody({
    model: c.model,
    aspect: c.aspect,
    poisson: c.poisson,
    level: c.mesh,
  });
  const R = c.equatorialRadius;
  const r = body.contactR.map((x) => x * R);
  const zPole = body.contactZ[0] * R;
  const gap = r.map((ri, i) => zPole - body.contactZ[i] * R + padLift(c.pad, ri));
  const stiffnessScale = c.model === 'axisymmetric' ? c.modulus * R : c.modulus;
  return { case: c, body, r, gap, stiffnessScale };
}
