import { STANDARD_GRAVITY } from '../constants';
import { requirePositive } from '../validate';
import { requireFiniteResult } from './finite-result';

/**
 * Duration factor of an elastic Hertz impact, t = factor·δ* / V, from
 * 2∫₀¹ (1 − ξ^(5/2))^(−½) dξ = (4/5)·B(2/5, 1/2) [computed]; Johnson 1985 §11.4 quotes 2.94 [memory].
 */
const CONTACT_TIME_FACTOR = 2.943275;

/** The impacting body and the flat, SI; `g` defaults to standard gravity. */
export interface HertzImpactBodies {
  /** mass of the falling body, kg (> 0); for two free bodies use the reduced mass */
  mass: number;
  /** effective radius R, m (sphere on flat: the sphere radius; see effectiveRadius) */
  radius: number;
  /** effective modulus E*, Pa (see effectiveModulus) */
  effectiveModulus: number;
  /** gravitational acceleration, m/s² (> 0); default 9.80665 */
  g?: number;
}

/** Inputs of an elastic Hertz impact from a drop height (SI). */
export interface HertzImpactInput extends HertzImpactBodies {
  /** free-fall height above the point of first contact, m (> 0) */
  dropHeight: number;
}

/** Peak state of an elastic Hertz impact. Pressures compressive, reported positive. */
export interface HertzImpactState {
  /** impact speed V = √(2gh), m/s */
  velocity: number;
  /** kinetic energy at impact ½mV², J */
  impactEnergy: number;
  /** greatest approach δ*, m */
  maxApproach: number;
  /** greatest contact force F*, N */
  peakForce: number;
  /** contact radius at δ*, a* = √(Rδ*), m */
  contactRadius: number;
  /** peak pressure at δ*, p₀* = (2E* / π)(δ* / R)^½, Pa */
  peakPressure: number;
  /** duration of contact ≈ 2.94 δ* / V, s */
  contactTime: number;
}

function gravityOf(input: HertzImpactBodies): number {
  return input.g === undefined ? STANDARD_GRAVITY : requirePositive('g', input.g);
}

function checkBodies(input: HertzImpactBodies): void {
  requirePositive('mass', input.mass);
  requirePositive('radius', input.radius);
  requirePositive('effectiveModulus', input.effectiveModulus);
}

/**
 * Quasi-static elastic Hertz impact of a sphere of mass m dropped from height h onto a rigid
 * flat (or another body via E*, R), Johnson, Contact Mechanics, 1985, §11.4 [memory]:
 * V = √(2gh), δ* = (15mV²/(16E*R^½))^(2/5), F* = (4/3)E*R^½δ*^(3/2), a* = √(Rδ*),
 * p₀* = (2E* / π)(δ* / R)^½, t ≈ 2.94 δ* / V. Elastic and lossless.
 * @throws FemInputError naming 'mass', 'radius', 'effectiveModulus', 'dropHeight' or 'g'
 */
export function hertzImpact(input: HertzImpactInput): HertzImpactState {
  checkBodies(input);
  requirePositive('dropHeight', input.dropHeight);
  const g = gravityOf(input);
  const { mass, radius, effectiveModulus: modulus } = input;
  const velocity = Math.sqrt(2 * g * input.dropHeight);
  const sqrtR = Math.sqrt(radius);
  const maxApproach = ((15 * mass * velocity * velocity) / (16 * modulus * sqrtR)) ** 0.4;
  const result: HertzImpactState = {
    velocity,
    impactEnergy: 0.5 * mass * velocity * velocity,
    maxApproach,
    peakForce: (4 / 3) * modulus * sqrtR * maxApproach ** 1.5,
    contactRadius: Math.sqrt(radius * maxApproach),
    peakPressure: ((2 * modulus) / Math.PI) * Math.sqrt(maxApproach / radius),
    contactTime: (CONTACT_TIME_FACTOR * maxApproach) / velocity,
  };
  for (const [quantity, value] of Object.entries(result)) {
    requireFiniteResult('dropHeight', quantity, value);
  }
  return result;
}

/** Inputs of the largest drop height under a peak-pressure limit (SI). */
export interface HertzImpactHeightInput extends HertzImpactBodies {
  /** largest allowed peak contact pressure p₀*, Pa (> 0) */
  pressureLimit: number;
}

/**
 * Largest drop height, m, for which the elastic Hertz impact peak pressure stays at or below
 * `pressureLimit` (inverse of hertzImpact, derived from the same relations [computed]):
 * p₀* = (2E* / π)(δ* / R)^½ gives δ*_lim = R(πp_lim/(2E*))²; then V² = 16E*R^½δ*^(5/2)/(15m) and
 * h = V²/(2g). Because p₀* grows only as h^(1/5), the height is very sensitive to the limit
 * (h ∝ p_lim⁵).
 * @throws FemInputError naming 'mass', 'radius', 'effectiveModulus', 'pressureLimit' or 'g'
 */
export function hertzImpactMaxDropHeight(input: HertzImpactHeightInput): number {
  checkBodies(input);
  requirePositive('pressureLimit', input.pressureLimit);
  const g = gravityOf(input);
  const { mass, radius, effectiveModulus: modulus } = input;
  const approach = radius * ((Math.PI * input.pressureLimit) / (2 * modulus)) ** 2;
  const velocitySquared = (16 * modulus * Math.sqrt(radius) * approach ** 2.5) / (15 * mass);
  return requireFiniteResult('pressureLimit', 'the drop height', velocitySquared / (2 * g));
}
