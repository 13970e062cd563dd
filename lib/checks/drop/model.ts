import {
  hertzBruiseRadius,
  effectiveModulus,
  effectiveRadius,
  hertzImpact,
  hertzImpactMaxDropHeight,
  STANDARD_GRAVITY,
  type HertzImpactState,
} from '@/fem';
import { DROP_SURFACES, type DropSurface } from '../surfaces';

/** The falling fruit in SI units. */
export interface FruitSI {
  modulus: number; // Pa
  poisson: number;
  radius: number; // m
  mass: number; // kg
}

/** The counterface in SI units; `thickness` only for padding. */
export interface SurfaceSI {
  modulus: number; // Pa; Infinity for rigid
  poisson: number;
  radius: number; // m; Infinity for a flat
  thickness?: number; // m
}

export function surfaceSI(
  surface: DropSurface,
  fruit: FruitSI,
  pad?: { modulusMpa: number; thicknessMm: number },
): SurfaceSI {
  if (surface === 'fruit')
    return { modulus: fruit.modulus, poisson: fruit.poisson, radius: fruit.radius };
  const s = DROP_SURFACES[surface];
  const modulusMpa = s.modulusMpa ?? pad!.modulusMpa;
  return {
    modulus: modulusMpa * 1e6,
    poisson: s.poisson!,
    radius: Infinity,
    ...(pad && surface === 'foam' && { thickness: pad.thicknessMm / 1000 }),
  };
}

function bodies(fruit: FruitSI, surface: SurfaceSI) {
  return {
    mass: fruit.mass,
    radius: effectiveRadius(fruit.radius, surface.radius),
    effectiveModulus: effectiveModulus(
      fruit.modulus,
      fruit.poisson,
      surface.modulus,
      surface.poisson,
    ),
  };
}

/**
 * Elastic Hertz impact of the fruit dropped from `height` m onto the surface (K. L. Johnson,
 * Contact Mechanics, 1985, §11.4): lossless, quasi-static, so the peak force and pressure are an
 * upper bound for a viscoelastic, skinned fruit.
 */
export function impactAt(fruit: FruitSI, surface: SurfaceSI, height: number): HertzImpactState {
  return hertzImpact({ ...bodies(fruit, surface), dropHeight: height });
}

/** Largest height, m, whose elastic Hertz peak pressure stays at or below `pressureLimit` Pa. */
export function heightForPressure(
  fruit: FruitSI,
  surface: SurfaceSI,
  pressureLimit: number,
): number {
  return hertzImpactMaxDropHeight({ ...bodies(fruit, surface), pressureLimit });
}

/** Drop height, m, that gives the fruit this kinetic energy, J: h = E/(m g). */
export function heightForEnergy(fruit: FruitSI, energy: number): number {
  return energy / (fruit.mass * STANDARD_GRAVITY);
}

/**
 * The bruise radius, m, an impact leaves: the region of the Hertz field above the threshold at
 * the moment of peak compression (hertzBruiseRadius), with the impact's contact radius.
 */
export function impactBruiseRadius(
  fruit: FruitSI,
  surface: SurfaceSI,
  contactRadius: number,
  threshold: number,
): number {
  return hertzBruiseRadius(bodies(fruit, surface), contactRadius, threshold);
}

/**
 * Largest height, m, whose impact bruise stays within radius `limit` m: the peak pressure at which
 * the region above the threshold reaches it, p₀ = √(p_t² + (2E*b/(πR))²) (from p₀ = 2aE* / (πR)
 * and a² = b² + a_t², Johnson 1985, eqs. 4.24–4.25), then the height for that peak.
 */
export function heightForBruise(
  fruit: FruitSI,
  surface: SurfaceSI,
  threshold: number,
  limit: number,
): number {
  const b = bodies(fruit, surface);
  const p0 = Math.hypot(threshold, (2 * b.effectiveModulus * limit) / (Math.PI * b.radius));
  return heightForPressure(fruit, surface, p0);
}
