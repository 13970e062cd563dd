import { FemInputError } from '../errors';
import { requireNonNegative, requirePositive } from '../validate';
import { requireFiniteResult } from './finite-result';

/** Largest ratio of principal radii accepted; beyond it the contact is effectively a line. */
const MAX_RADIUS_RATIO = 1e6;

/**
 * Complete elliptic integrals by the arithmetic-geometric mean, from the complementary modulus
 * q = √(1 − e²). Returns K(e) and s = (K − E)/K = Σ 2ⁿ⁻¹cₙ² (Abramowitz & Stegun 1964, 17.6
 * [memory]); s is formed without the cancellation of K − E near e = 0.
 */
export function ellipticKAndDeficit(q: number): { k: number; s: number } {
  let a = 1;
  let b = q;
  let weight = 0.5;
  let s = weight * (1 - q) * (1 + q);
  for (let i = 0; i < 64; i++) {
    const c = (a - b) / 2;
    [a, b] = [(a + b) / 2, Math.sqrt(a * b)];
    weight *= 2;
    s += weight * c * c;
    if (c <= 1e-16 * a) break;
  }
  return { k: Math.PI / (2 * a), s };
}

// Hertz ellipse, semi-axes a ≥ b, q = b/a, e² = 1 − q² (Johnson, Contact Mechanics, 1985, §4.2
// [memory]): A = p₀b(K − E)/(E*e²a²), B = p₀b((a/b)²E − K)/(E*e²a²), δ = p₀bK/E*, F = (2/3)πabp₀.
// Hence B/A = (e² − s)/(q²s) with s as above, which falls from ∞ to 1 as q rises from 0 to 1.
function curvatureRatio(q: number): number {
  const { s } = ellipticKAndDeficit(q);
  return ((1 - q) * (1 + q) - s) / (q * q * s);
}

function axisRatioFor(ratio: number): number {
  if (ratio === 1) return 1;
  let lo = -40;
  let hi = 0;
  for (let i = 0; i < 200 && hi - lo > 1e-15; i++) {
    const mid = (lo + hi) / 2;
    if (curvatureRatio(Math.exp(mid)) > ratio) lo = mid;
    else hi = mid;
  }
  return Math.exp((lo + hi) / 2);
}

/** Inputs of a Hertz elliptical contact at a given approach (SI). */
export interface HertzEllipticalInput {
  /**
   * principal radii of relative curvature at the contact, m, any order (> 0); for a convex body
   * on a flat, its two principal radii of curvature at the contact point
   */
  radii: readonly [number, number];
  /** effective modulus E*, Pa (see effectiveModulus) */
  effectiveModulus: number;
  /** approach δ of distant points of the two bodies, m (≥ 0) */
  approach: number;
}

/** Hertz elliptical-contact state. Pressures are compressive and reported positive. */
export interface HertzEllipticalState {
  force: number;
  /** semi-axis along the larger radius of curvature, m */
  semiMajorAxis: number;
  /** semi-axis along the smaller radius of curvature, m */
  semiMinorAxis: number;
  /** peak pressure p₀ = 3F/(2πab), Pa */
  peakPressure: number;
  /** mean pressure 2p₀/3, Pa */
  meanPressure: number;
}

/**
 * Hertz contact of two bodies with aligned principal curvatures (elliptical contact) at a given
 * approach, solved exactly from the elliptic-integral relations (no tabulated constants). With
 * equal radii it reduces to hertzSphereAtApproach.
 * @throws FemInputError naming 'radii', 'effectiveModulus' or 'approach'
 */
export function hertzEllipticalAtApproach(input: HertzEllipticalInput): HertzEllipticalState {
  if (!Array.isArray(input.radii) || input.radii.length !== 2) {
    throw new FemInputError('radii', 'radii must hold exactly two principal radii');
  }
  const [r1, r2] = input.radii.map((r) => requirePositive('radii', r));
  requirePositive('effectiveModulus', input.effectiveModulus);
  requireNonNegative('approach', input.approach);
  const ratio = Math.max(r1, r2) / Math.min(r1, r2);
  if (ratio > MAX_RADIUS_RATIO) {
    throw new FemInputError('radii', 'radii differ by more than 10⁶: treat it as a line contact');
  }
  const smallCurvature = 1 / (2 * Math.max(r1, r2)); // A
  const q = axisRatioFor(ratio);
  const { k, s } = ellipticKAndDeficit(q);
  const m = (1 - q) * (1 + q);
  // c = p₀/(E*b) from the A relation; its e → 0 limit is 4A/π.
  const c = q === 1 ? (4 * smallCurvature) / Math.PI : (smallCurvature * m) / (q * q * k * s);
  const b = Math.sqrt(input.approach / (c * k));
  const a = b / q;
  const peakPressure = input.effectiveModulus * c * b;
  const force = (2 / 3) * Math.PI * a * b * peakPressure;
  return {
    force: requireFiniteResult('approach', 'the force', force),
    semiMajorAxis: requireFiniteResult('approach', 'the contact size', a),
    semiMinorAxis: b,
    peakPressure: requireFiniteResult('effectiveModulus', 'the peak pressure', peakPressure),
    meanPressure: (2 / 3) * peakPressure,
  };
}
