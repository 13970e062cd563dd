/**
 * Stage 2 of the squeeze pipeline: the validated case (stage 1) bound to its cached condensed
 * unit body, graded to the expected contact and refined at the pad's edge, in real units.
 */
import { getCondensedBody, type FemBody } from '../body/cache';
import { contactBandOf, edgeBandOf, poissonBandOf } from '../body/grading';
import type { UnitBodyKey } from '../types';
import { validateSqueezeInput, type SqueezeCase, type SqueezeInput } from './01-input';
import { contactPoints, type ContactPoints } from './contact-points';
import { padReach } from './pad';

/** A squeeze case on its condensed body: real point radii and initial gaps to the pad. */
export interface BodyStage {
  case: SqueezeCase;
  /** the shared unit body (equatorial radius 1 m, E = 1 Pa); do not mutate */
  body: FemBody;
  /** where the pad can touch: the contact nodes, and the pad's edge between two of them */
  points: ContactPoints;
  /** real radii of the contact points, m (= points.r) */
  r: Float64Array;
  /** initial axial gap between each point and the pad, m (Infinity beyond the pad) */
  gap: Float64Array;
  /** K_real = stiffnessScale · K_unit: E′·R (axisymmetric) or E′ (plane strain, per metre) */
  stiffnessScale: number;
  /**
   * E′ = E (1 − ν_b²)/(1 − ν²), Pa: the modulus given to the unit body built with the band value
   * ν_b of Poisson's ratio, so that it has the exact E* (stresses scale with E′ too)
   */
  bodyModulus: number;
  /** Hertz estimate of the contact radius at the full travel, √(R_p·travel), m */
  expectedContact: number;
}

/**
 * Validates `input` and binds it to the cached unit body of its model, aspect, ν band, mesh
 * level, contact-scale band and pad-edge band (built on first use). The contact scale is the
 * Hertz estimate √(R_p·d) at the full travel d with the pole radius R_p = R_eq²/R_ax (Johnson,
 * Contact Mechanics, 1985, ch. 4), or the case's `meshContactRadius` when given (a run that
 * refines a small contact), and at most the pad's outer radius. Throws FemInputError naming the field for bad input.
 */
export function prepareBody(input: SqueezeInput): BodyStage {
  const c = validateSqueezeInput(input);
  const R = c.equatorialRadius;
  const expectedContact = Math.sqrt(((R * R) / c.axialRadius) * c.travel);
  // A pad narrower than the plate's contact bounds the contact by its outer radius.
  const scale = Math.min(c.meshContactRadius ?? expectedContact, padReach(c.pad));
  const contactBand = contactBandOf(scale / R);
  const key: UnitBodyKey = {
    model: c.model,
    aspect: c.aspect,
    poisson: poissonBandOf(c.poisson),
    level: c.mesh,
    contactBand,
  };
  const { flatRadius, diameter, edgeRadius } = c.pad;
  if (flatRadius !== null && diameter !== null && edgeRadius !== null) {
    const band = edgeBandOf(c.mesh, contactBand, {
      flat: flatRadius / R,
      outer: diameter / 2 / R,
      edge: edgeRadius / R,
      maxContact: (1.25 * expectedContact) / R,
    });
    if (band) key.edgeBand = band;
  }
  const body = getCondensedBody(key);
  const points = contactPoints(body, c.pad, R);
  const bodyModulus = (c.modulus * (1 - key.poisson ** 2)) / (1 - c.poisson ** 2);
  const stiffnessScale = c.model === 'axisymmetric' ? bodyModulus * R : bodyModulus;
  return {
    case: c,
    body,
    points,
    r: points.r,
    gap: points.gap,
    stiffnessScale,
    bodyModulus,
    expectedContact,
  };
}
