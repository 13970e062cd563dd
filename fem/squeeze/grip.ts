import { STANDARD_GRAVITY } from '../constants';
import type { BodyModel } from '../types';

/**
 * Fruit mass from density ρ (kg/m³) and radii (m): spheroid (4/3)π R_eq² R_ax in kg; for the
 * plane-strain slice the elliptical prism ρ π R_eq R_ax in kg per metre of length.
 */
export function fruitMass(
  model: BodyModel,
  equatorialRadius: number,
  axialRadius: number,
  density: number,
): number {
  return model === 'axisymmetric'
    ? density * (4 / 3) * Math.PI * equatorialRadius ** 2 * axialRadius
    : density * Math.PI * equatorialRadius * axialRadius;
}

/** Liftability inputs of the two-pad friction grip. */
export interface GripRule {
  /** fruit mass, kg (or kg/m in plane strain) */
  mass: number;
  /** Coulomb friction coefficient μ between pad and skin */
  friction: number;
  /** safety factor on weight SF */
  safetyFactor: number;
  /** upward acceleration of the lift in g */
  accelG: number;
}

/** Design load the grip must carry, SF·m·(g + a), N (or N/m). */
export function requiredHoldLoad(rule: GripRule): number {
  return rule.safetyFactor * rule.mass * STANDARD_GRAVITY * (1 + rule.accelG);
}

/**
 * Lift ratio of two opposed pads each pressing with normal force F (N): μ·2F / (SF·m·(g + a)),
 * from the grip rule 2μN ≥ SF·m(g + a) [common practice]. ≥ 1 means the fruit can be lifted.
 */
export function liftRatio(padForce: number, rule: GripRule): number {
  return (rule.friction * 2 * padForce) / requiredHoldLoad(rule);
}

/** Margin = allowed / actual (> 1 is safe), or null when either is missing or the actual is zero. */
export function margin(allowed: number | null, actual: number): number | null {
  return allowed === null || !(actual > 0) ? null : allowed / actual;
}
