import { requirePoisson, requirePositive } from '../validate';
import { requireFiniteResult } from './finite-result';

/**
 * Effective (contact) modulus E* in Pa: 1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂
 * (Johnson, Contact Mechanics, 1985, ch. 4).
 *
 * @param modulus1 Young's modulus of body 1, Pa (> 0)
 * @param poisson1 Poisson's ratio of body 1, in [0, 0.5)
 * @param modulus2 Young's modulus of body 2, Pa; omit or pass Infinity for a rigid counterface,
 *   which gives E* = E₁/(1 − ν₁²)
 * @param poisson2 Poisson's ratio of body 2; required when `modulus2` is finite, ignored when rigid
 * @throws FemInputError naming 'modulus1', 'poisson1', 'modulus2' or 'poisson2'
 */
export function effectiveModulus(
  modulus1: number,
  poisson1: number,
  modulus2?: number,
  poisson2?: number,
): number {
  requirePositive('modulus1', modulus1);
  requirePoisson('poisson1', poisson1);
  let compliance = (1 - poisson1 * poisson1) / modulus1;
  if (modulus2 !== undefined && modulus2 !== Infinity) {
    requirePositive('modulus2', modulus2);
    const nu2 = requirePoisson('poisson2', poisson2 as number);
    compliance += (1 - nu2 * nu2) / modulus2;
  }
  return 1 / requireFiniteResult('modulus1', 'the compliance', compliance);
}

/**
 * Effective radius of curvature R in m: 1/R = 1/R₁ + 1/R₂ (Johnson 1985, ch. 4). Both surfaces
 * convex; concave counterfaces are not supported.
 *
 * @param radius1 radius of body 1, m (> 0)
 * @param radius2 radius of body 2, m; omit or pass Infinity for a flat, which gives R = R₁
 * @throws FemInputError naming 'radius1' or 'radius2'
 */
export function effectiveRadius(radius1: number, radius2?: number): number {
  requirePositive('radius1', radius1);
  if (radius2 === undefined || radius2 === Infinity) return radius1;
  requirePositive('radius2', radius2);
  return (radius1 * radius2) / (radius1 + radius2);
}
