// Test reference, independent of fem/: the frictionless contact of a rigid axisymmetric punch of
// arbitrary profile on an elastic half-space (I. N. Sneddon, "The relation between load and
// penetration in the axisymmetric Boussinesq problem for a punch of arbitrary profile",
// Int. J. Eng. Sci. 3 (1965) 47–57 [from memory]), evaluated by Gauss–Legendre quadrature.
//
// For a profile h(r) (gap between the undeformed surfaces, h(0) = 0, h' ≥ 0) and contact radius
// a, Sneddon's solution with a bounded edge pressure gives
//   penetration  δ = a ∫₀ᵃ h'(r) / √(a² − r²) dr,
//   load         P = 2E* ∫₀ᵃ r² h'(r) / √(a² − r²) dr,
// and the pressure follows by Abel inversion of the same integral,
//   p(r) = (E*/π) ∫ᵣᵃ g'(t) / √(t² − r²) dt,   g(t) = t ∫₀ᵗ h'(x) / √(t² − x²) dx,
// which is the same g as in the method of dimensionality reduction (V. L. Popov & M. Heß,
// Method of Dimensionality Reduction in Contact Mechanics and Friction, Springer 2015, ch. 3
// [from memory]). With x = t sin φ: g(t) = t ∫₀^{π/2} h'(t sin φ) dφ and
// g'(t) = ∫₀^{π/2} [h'(t sin φ) + t sin φ · h''(t sin φ)] dφ.
// Checked in sneddon.test.ts against Hertz (h = r²/2R gives a² = Rδ, P = 4E*a³/3R,
// p = (2E*/πR)√(a² − r²); Johnson, Contact Mechanics, 1985, ch. 3–4).

/** An axisymmetric profile: slope h'(r), curvature h''(r), and radii where h'' jumps. */
export interface Profile {
  slope(r: number): number;
  curvature(r: number): number;
  kinks: number[];
}

/** Sphere of radius `radius` against a flat pad of overall diameter 2·`outer` with a circular edge of radius `edge`. */
export function roundedPadOnSphere(radius: number, outer: number, edge: number): Profile {
  const flat = outer - edge;
  return {
    slope: (r) => r / radius + (r > flat ? (r - flat) / Math.sqrt(edge ** 2 - (r - flat) ** 2) : 0),
    curvature: (r) =>
      1 / radius + (r > flat ? edge ** 2 / (edge ** 2 - (r - flat) ** 2) ** 1.5 : 0),
    kinks: [flat],
  };
}

/** Gauss–Legendre nodes and weights on [−1, 1] (Newton on the Legendre recurrence). */
function gaussLegendre(n: number): { x: number[]; w: number[] } {
  const x: number[] = [];
  const w: number[] = [];
  for (let i = 1; i <= n; i++) {
    let t = Math.cos((Math.PI * (i - 0.25)) / (n + 0.5));
    let dp = 0;
    for (let it = 0; it < 100; it++) {
      let p0 = 1;
      let p1 = t;
      for (let k = 2; k <= n; k++) [p0, p1] = [p1, ((2 * k - 1) * t * p1 - (k - 1) * p0) / k];
      dp = (n * (t * p1 - p0)) / (t * t - 1);
      const step = p1 / dp;
      t -= step;
      if (Math.abs(step) < 1e-15) break;
    }
    x.push(t);
    w.push(2 / ((1 - t * t) * dp * dp));
  }
  return { x, w };
}

const GL = gaussLegendre(48);

/** ∫ f over [lo, hi], split at the given interior points, 48-point Gauss–Legendre per piece. */
function integrate(
  f: (x: number) => number,
  lo: number,
  hi: number,
  splits: number[] = [],
): number {
  const cuts = [lo, ...splits.filter((s) => s > lo && s < hi).sort((p, q) => p - q), hi];
  let sum = 0;
  for (let k = 0; k + 1 < cuts.length; k++) {
    const [a, b] = [cuts[k], cuts[k + 1]];
    for (let i = 0; i < GL.x.length; i++)
      sum += ((b - a) / 2) * GL.w[i] * f(((b - a) * GL.x[i] + a + b) / 2);
  }
  return sum;
}

/** Sneddon's solution at contact radius `a` (m) for effective modulus E* (Pa). */
export function sneddonAtRadius(profile: Profile, a: number, modulus: number) {
  // r = a sin θ removes the inverse square root at r = a.
  const theta = (r: number) => Math.asin(Math.min(r / a, 1));
  const splits = profile.kinks.filter((k) => k < a).map(theta);
  const approach = a * integrate((t) => profile.slope(a * Math.sin(t)), 0, Math.PI / 2, splits);
  const force =
    2 *
    modulus *
    integrate(
      (t) => (a * Math.sin(t)) ** 2 * profile.slope(a * Math.sin(t)),
      0,
      Math.PI / 2,
      splits,
    );
  const gPrime = (t: number) => {
    const phi = profile.kinks.filter((k) => k < t).map((k) => Math.asin(k / t));
    const f = (p: number) => {
      const x = t * Math.sin(p);
      return profile.slope(x) + x * profile.curvature(x);
    };
    return integrate(f, 0, Math.PI / 2, phi);
  };
  const pressure = (r: number) => {
    if (r >= a) return 0;
    // t = √(r² + u²) removes the inverse square root at t = r.
    const top = Math.sqrt(a * a - r * r);
    const cuts = profile.kinks.filter((k) => k > r && k < a).map((k) => Math.sqrt(k * k - r * r));
    return (
      (modulus / Math.PI) *
      integrate((u) => gPrime(Math.sqrt(r * r + u * u)) / Math.sqrt(r * r + u * u), 0, top, cuts)
    );
  };
  return { contactRadius: a, approach, force, pressure };
}

/** Sneddon's solution at load `force` (N): the contact radius by bisection (P rises with a). */
export function sneddonAtForce(
  profile: Profile,
  force: number,
  modulus: number,
  maxRadius: number,
) {
  let lo = 0;
  let hi = maxRadius;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (sneddonAtRadius(profile, mid, modulus).force < force) lo = mid;
    else hi = mid;
  }
  return sneddonAtRadius(profile, (lo + hi) / 2, modulus);
}
