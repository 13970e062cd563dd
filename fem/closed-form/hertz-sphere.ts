import { requireNonNegative, requirePoisson, requirePositive } from '../validate';
import { requireFiniteResult } from './finite-result';

/** Geometry and material of a Hertz point contact (sphere on flat, or two spheres). */
export interface HertzSphereBodies {
  /** effective radius R, m (see effectiveRadius) */
  radius: number;
  /** effective modulus E*, Pa (see effectiveModulus) */
  effectiveModulus: number;
}

/** Inputs of a Hertz point contact at a given force (SI). */
export interface HertzSphereAtForceInput extends HertzSphereBodies {
  /** normal force F, N (≥ 0) */
  force: number;
}

/** Inputs of a Hertz point contact at a given approach (SI). */
export interface HertzSphereAtApproachInput extends HertzSphereBodies {
  /** approach δ of distant points of the two bodies, m (≥ 0); between two plates travel = 2δ */
  approach: number;
}

/** Hertz point-contact state. Pressures are compressive and reported positive. */
export interface HertzSphereState {
  /** normal force F, N */
  force: number;
  /** contact radius a, m */
  contactRadius: number;
  /** peak (centre) pressure p₀, Pa */
  peakPressure: number;
  /** mean pressure 2p₀/3, Pa */
  meanPressure: number;
  /** approach δ, m */
  approach: number;
}

function checkBodies(input: HertzSphereBodies): void {
  requirePositive('radius', input.radius);
  requirePositive('effectiveModulus', input.effectiveModulus);
}

// Johnson 1985 ch. 4: a = √(Rδ), p₀ = 2aE* / (πR) (same as 3F/(2πa²), but finite at F = 0),
// F = (4/3) E* R^½ δ^(3/2).
function stateFromContactRadius(a: number, radius: number, modulus: number): HertzSphereState {
  const approach = (a * a) / radius;
  const peakPressure = (2 * a * modulus) / (Math.PI * radius);
  const force = (4 / 3) * modulus * Math.sqrt(radius) * approach ** 1.5;
  return {
    force: requireFiniteResult('force', 'the contact force', force),
    contactRadius: a,
    peakPressure: requireFiniteResult('effectiveModulus', 'the peak pressure', peakPressure),
    meanPressure: (2 / 3) * peakPressure,
    approach: requireFiniteResult('approach', 'the approach', approach),
  };
}

/**
 * Hertz sphere on flat or sphere on sphere at a given force: a = (3FR/4E*)^(1/3),
 * p₀ = 3F/(2πa²), mean 2p₀/3, δ = a²/R (Johnson, Contact Mechanics, 1985, ch. 4).
 * Frictionless, linear elastic, a ≪ R.
 * @throws FemInputError naming 'force', 'radius' or 'effectiveModulus'
 */
export function hertzSphereAtForce(input: HertzSphereAtForceInput): HertzSphereState {
  checkBodies(input);
  requireNonNegative('force', input.force);
  const a = Math.cbrt((3 * input.force * input.radius) / (4 * input.effectiveModulus));
  const state = stateFromContactRadius(
    requireFiniteResult('force', 'the contact radius', a),
    input.radius,
    input.effectiveModulus,
  );
  return { ...state, force: input.force };
}

/**
 * Hertz sphere on flat or sphere on sphere at a given approach δ: F = (4/3) E* R^½ δ^(3/2),
 * a = √(Rδ), p₀ = (2E* / π)(δ/R)^½ (Johnson 1985, ch. 4).
 * @throws FemInputError naming 'approach', 'radius' or 'effectiveModulus'
 */
export function hertzSphereAtApproach(input: HertzSphereAtApproachInput): HertzSphereState {
  checkBodies(input);
  requireNonNegative('approach', input.approach);
  const a = Math.sqrt(input.radius * input.approach);
  const state = stateFromContactRadius(
    requireFiniteResult('approach', 'the contact radius', a),
    input.radius,
    input.effectiveModulus,
  );
  return { ...state, approach: input.approach };
}

/** Largest shear stress below a Hertz point contact, found on the axis of symmetry. */
export interface HertzSubsurfaceShear {
  /** maximum shear stress ½|σ_z − σ_r|, Pa */
  maxShear: number;
  /** depth below the surface at which it occurs, m */
  depth: number;
}

// Stresses on the axis over p₀ at ζ = z/a (Johnson 1985, eq. 3.45 [memory]):
// σ_z = −1/(1+ζ²), σ_r = σ_θ = −(1+ν)(1 − ζ·atan(1/ζ)) + ½/(1+ζ²). Principal axes, so τ = ½|σ_z − σ_r|.
function axisShearOverP0(zeta: number, poisson: number): number {
  const sz = -1 / (1 + zeta * zeta);
  const sr = -(1 + poisson) * (1 - zeta * Math.atan(1 / zeta)) - 0.5 * sz;
  return 0.5 * Math.abs(sz - sr);
}

/**
 * Maximum subsurface shear under a Hertz point contact, maximised numerically along the axis
 * (fine scan of 0 ≤ z/a ≤ 3, then golden-section refinement).
 *
 * @param peakPressure p₀, Pa (> 0)
 * @param contactRadius a, m (> 0)
 * @param poisson Poisson's ratio of the body examined, in [0, 0.5)
 * @throws FemInputError naming 'peakPressure', 'contactRadius' or 'poisson'
 */
export function hertzSubsurfaceShear(
  peakPressure: number,
  contactRadius: number,
  poisson: number,
): HertzSubsurfaceShear {
  requirePositive('peakPressure', peakPressure);
  requirePositive('contactRadius', contactRadius);
  requirePoisson('poisson', poisson);
  const steps = 300;
  const top = 3;
  let best = 0;
  for (let i = 1; i <= steps; i++) {
    const zeta = (top * i) / steps;
    if (axisShearOverP0(zeta, poisson) > axisShearOverP0((top * best) / steps, poisson)) best = i;
  }
  let lo = (top * Math.max(best - 1, 0)) / steps;
  let hi = (top * Math.min(best + 1, steps)) / steps;
  const ratio = (Math.sqrt(5) - 1) / 2;
  while (hi - lo > 1e-10) {
    const x1 = hi - ratio * (hi - lo);
    const x2 = lo + ratio * (hi - lo);
    if (axisShearOverP0(x1, poisson) < axisShearOverP0(x2, poisson)) lo = x1;
    else hi = x2;
  }
  const zeta = (lo + hi) / 2;
  return {
    maxShear: axisShearOverP0(zeta, poisson) * peakPressure,
    depth: zeta * contactRadius,
  };
}
