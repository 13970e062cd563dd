import {
  effectiveModulus,
  hertzCylinderPerLength,
  hertzSphereAtApproach,
  hertzSphereAtForce,
  hertzSubsurfaceShear,
} from '../closed-form';
import type { SqueezeCase } from './01-input';

/** Hertz state for comparison, SI (N or N/m, m, Pa); pressures compressive positive. */
export interface HertzFigures {
  force: number;
  /** contact radius a (axisymmetric) or half-width b (plane strain), m */
  contactRadius: number;
  peakPressure: number;
  meanPressure: number;
  /** approach per side, m; null for the line contact (it depends on the body's depth) */
  approach: number | null;
  /** largest subsurface shear on the axis and its depth (point contact only), Pa and m */
  maxShear: number | null;
  maxShearDepth: number | null;
}

/**
 * Closed-form comparison: the fruit between two rigid flat plates, each contact a Hertz contact
 * with the pole's radius of curvature R_eq²/R_ax (equal in both directions at the pole of a
 * spheroid) and E* = E/(1 − ν²) (Johnson, Contact Mechanics, 1985, ch. 4). `atTravel` takes the
 * approach per side equal to the pad travel (null in plane strain); `atForce` uses the model's force.
 */
export interface HertzComparison {
  radius: number;
  effectiveModulus: number;
  atTravel: HertzFigures | null;
  atForce: HertzFigures;
}

/** Hertz figures for a squeeze case at its travel and at the model's pad force (N or N/m). */
export function hertzComparison(c: SqueezeCase, travel: number, force: number): HertzComparison {
  const radius = c.equatorialRadius ** 2 / c.axialRadius;
  const modulus = effectiveModulus(c.modulus, c.poisson);
  if (c.model === 'plane-strain') {
    const line = hertzCylinderPerLength({
      forcePerLength: force,
      radius,
      effectiveModulus: modulus,
    });
    const atForce: HertzFigures = {
      force,
      contactRadius: line.halfWidth,
      peakPressure: line.peakPressure,
      meanPressure: line.meanPressure,
      approach: null,
      maxShear: null,
      maxShearDepth: null,
    };
    return { radius, effectiveModulus: modulus, atTravel: null, atForce };
  }
  const bodies = { radius, effectiveModulus: modulus };
  const point = (s: ReturnType<typeof hertzSphereAtForce>): HertzFigures => {
    const shear =
      s.peakPressure > 0 ? hertzSubsurfaceShear(s.peakPressure, s.contactRadius, c.poisson) : null;
    return {
      force: s.force,
      contactRadius: s.contactRadius,
      peakPressure: s.peakPressure,
      meanPressure: s.meanPressure,
      approach: s.approach,
      maxShear: shear ? shear.maxShear : 0,
      maxShearDepth: shear ? shear.depth : 0,
    };
  };
  return {
    radius,
    effectiveModulus: modulus,
    atTravel: point(hertzSphereAtApproach({ ...bodies, approach: travel })),
    atForce: point(hertzSphereAtForce({ ...bodies, force })),
  };
}
