import { requireNonNegative, requirePositive } from '../validate';
import { requireFiniteResult } from './finite-result';

/** Inputs of a Hertz line contact per unit length (SI). */
export interface HertzCylinderInput {
  /** normal load per unit length of the line contact P′, N/m (≥ 0) */
  forcePerLength: number;
  /** effective radius R, m (cylinder on flat: the cylinder radius; see effectiveRadius) */
  radius: number;
  /** effective modulus E*, Pa (see effectiveModulus) */
  effectiveModulus: number;
}

/** Hertz line contact per unit length. Pressures are compressive and reported positive. */
export interface HertzCylinderState {
  /** half-width b of the contact strip, m */
  halfWidth: number;
  /** peak (centre-line) pressure p₀, Pa */
  peakPressure: number;
  /** mean pressure P′/(2b) = πp₀/4, Pa */
  meanPressure: number;
}

/**
 * Hertz cylinder on flat (or two parallel cylinders via R, E*), per unit length:
 * b = (4P′R/(πE*))^½, p₀ = 2P′/(πb) (Johnson, Contact Mechanics, 1985, ch. 4). The approach of a
 * line contact depends on the bodies' depth and is not given here.
 * @throws FemInputError naming 'forcePerLength', 'radius' or 'effectiveModulus'
 */
export function hertzCylinderPerLength(input: HertzCylinderInput): HertzCylinderState {
  requireNonNegative('forcePerLength', input.forcePerLength);
  requirePositive('radius', input.radius);
  requirePositive('effectiveModulus', input.effectiveModulus);
  const halfWidth = requireFiniteResult(
    'forcePerLength',
    'the half-width',
    Math.sqrt((4 * input.forcePerLength * input.radius) / (Math.PI * input.effectiveModulus)),
  );
  // p₀ = 2P′/(πb) rewritten as E*·b/(2R) so that P′ = 0 gives 0 rather than 0/0.
  const peakPressure = requireFiniteResult(
    'effectiveModulus',
    'the peak pressure',
    (input.effectiveModulus * halfWidth) / (2 * input.radius),
  );
  return { halfWidth, peakPressure, meanPressure: (Math.PI / 4) * peakPressure };
}
