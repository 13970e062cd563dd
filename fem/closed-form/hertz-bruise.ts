import { requireNonNegative, requirePositive } from '../validate';
import type { HertzSphereBodies } from './hertz-sphere';

/**
 * The region of a Hertz point contact where the pressure exceeds a threshold p_t: the pressure is
 * p(r) = p₀√(1 − r²/a²) (Johnson, Contact Mechanics, 1985, eq. 4.25), so p > p_t inside
 * b = a√(1 − (p_t/p₀)²). With p₀ = 2aE* / (πR) (eq. 4.24) this is b = √(a² − a_t²), where
 * a_t = πR·p_t/(2E*) is the contact radius at which the peak first reaches p_t. Taken as the
 * surface extent of the bruise: the area the research and the grading standards measure.
 */
export function hertzBruiseRadius(
  bodies: HertzSphereBodies,
  contactRadius: number,
  threshold: number,
): number {
  requirePositive('radius', bodies.radius);
  requirePositive('effectiveModulus', bodies.effectiveModulus);
  requireNonNegative('contactRadius', contactRadius);
  requirePositive('threshold', threshold);
  const onset = onsetContactRadius(bodies, threshold);
  return contactRadius > onset ? Math.sqrt(contactRadius ** 2 - onset ** 2) : 0;
}

/** Contact radius a_t = πR·p_t/(2E*) at which the Hertz peak pressure reaches p_t, m. */
export function onsetContactRadius(bodies: HertzSphereBodies, threshold: number): number {
  return (Math.PI * bodies.radius * threshold) / (2 * bodies.effectiveModulus);
}

/**
 * The force at which the region above p_t reaches radius b: a = √(b² + a_t²) and
 * F = 4E*a³/(3R) (Johnson 1985, eq. 4.22 with δ = a²/R), N. b = 0 gives the onset force.
 */
export function hertzForceForBruiseRadius(
  bodies: HertzSphereBodies,
  threshold: number,
  bruiseRadius: number,
): number {
  requirePositive('threshold', threshold);
  requireNonNegative('bruiseRadius', bruiseRadius);
  const a = Math.sqrt(bruiseRadius ** 2 + onsetContactRadius(bodies, threshold) ** 2);
  return (4 * bodies.effectiveModulus * a ** 3) / (3 * bodies.radius);
}
