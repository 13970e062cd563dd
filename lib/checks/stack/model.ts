import {
  hertzBruiseRadius,
  hertzForceForBruiseRadius,
  effectiveModulus,
  effectiveRadius,
  hertzSphereAtForce,
  janssenMaxFillDepth,
  janssenVerticalPressure,
  rectangularBinHydraulicRadius,
  type JanssenBin,
} from '@/fem';

/** A bin of fruit in SI units. */
export interface StackSI {
  length: number; // m
  width: number; // m
  bulkDensity: number; // kg/m³
  wallFriction: number;
  lateralRatio: number;
  fruitRadius: number; // m
  modulus: number; // Pa
  poisson: number;
}

export function binOf(s: StackSI): JanssenBin {
  return {
    bulkDensity: s.bulkDensity,
    hydraulicRadius: rectangularBinHydraulicRadius(s.length, s.width),
    wallFriction: s.wallFriction,
    lateralRatio: s.lateralRatio,
  };
}

/**
 * Load on one contact of a bottom-layer fruit: the vertical pressure over the square a fruit
 * occupies in a simple cubic stack, F = σ_v d². One contact above carries it all — the harsher
 * case; in a denser random packing the load shares between three or four contacts.
 */
export function contactForce(s: StackSI, verticalPressure: number): number {
  const d = 2 * s.fruitRadius;
  return verticalPressure * d * d;
}

/** Two like fruit pressed together: R = R₁R₂/(R₁+R₂), 1/E* = 2(1−ν²)/E (Johnson 1985, ch. 4). */
export function pair(s: StackSI) {
  return {
    radius: effectiveRadius(s.fruitRadius, s.fruitRadius),
    effectiveModulus: effectiveModulus(s.modulus, s.poisson, s.modulus, s.poisson),
  };
}

/** Vertical pressure, contact force and Hertz fruit-to-fruit peak pressure at a depth, SI. */
export function stackAt(s: StackSI, depth: number) {
  const verticalPressure = janssenVerticalPressure({ ...binOf(s), depth });
  const force = contactForce(s, verticalPressure);
  const hertz = hertzSphereAtForce({ ...pair(s), force });
  return {
    verticalPressure,
    force,
    peakPressure: hertz.peakPressure,
    contactRadius: hertz.contactRadius,
  };
}

/**
 * Deepest fill, m, at which the bottom contact stays at or below `threshold` Pa, or null for any
 * depth. Inverts p₀ = (6FE*²/(π³R²))^(1/3) for the force (Johnson 1985, ch. 4), then Janssen for
 * the depth.
 */
export function deepestSafeFill(s: StackSI, threshold: number): number | null {
  const { radius, effectiveModulus: e } = pair(s);
  const forceLimit = (threshold ** 3 * Math.PI ** 3 * radius ** 2) / (6 * e * e);
  const d = 2 * s.fruitRadius;
  return janssenMaxFillDepth({ ...binOf(s), pressureLimit: forceLimit / (d * d) });
}

/** The bruise the bottom contact leaves at a depth: the radius where p > threshold, m. */
export function bruiseAt(s: StackSI, depth: number, threshold: number): number {
  return hertzBruiseRadius(pair(s), stackAt(s, depth).contactRadius, threshold);
}

/**
 * Deepest fill, m, at which the bottom contact's bruise stays within a radius `limit` (m), or
 * null for any depth: the force that makes that bruise (hertzForceForBruiseRadius), then Janssen.
 */
export function deepestFillWithin(s: StackSI, threshold: number, limit: number): number | null {
  const force = hertzForceForBruiseRadius(pair(s), threshold, limit);
  const d = 2 * s.fruitRadius;
  return janssenMaxFillDepth({ ...binOf(s), pressureLimit: force / (d * d) });
}
