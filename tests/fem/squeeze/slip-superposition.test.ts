import { describe, expect, it } from 'vitest';
import { ciavarellaJager, type NormalContactState } from '../../../fem/squeeze/slip-superposition';
import { expectFieldError } from '../closed-form/expect-close';

// Closed-form input, independent of the finite elements: a Hertz sphere on a flat (Johnson,
// Contact Mechanics, 1985, ch. 4), p(r) = p₀√(1 − r²/a²) with p₀ = 2aE*/(πR) ∝ a and
// P = (2/3)πa²p₀. Inputs invented: a = 4 mm, p₀ = 200 kPa, μ = 0.4.
const a = 0.004;
const p0 = 200e3;
const mu = 0.4;
const hertz = (radius: number, r: Float64Array): NormalContactState => {
  const peak = (p0 * radius) / a;
  return {
    force: (2 / 3) * Math.PI * radius * radius * peak,
    contactRadius: radius,
    pressure: r.map((x) => (x < radius ? peak * Math.sqrt(1 - (x / radius) ** 2) : 0)),
  };
};
const n = 2001;
const r = Float64Array.from({ length: n }, (_, i) => (1.2 * a * i) / (n - 1));
const current = hertz(a, r);
const P = current.force;
const map = (T: number) => ciavarellaJager(r, current, (s) => hertz(s, r), a, T, mu);

// Cattaneo–Mindlin (Johnson 1985, §7.2 [from memory]): stick radius c = a(1 − T/μP)^{1/3};
// traction q = (μp₀/a)[√(a² − r²) − √(c² − r²)] in the stick zone, (μp₀/a)√(a² − r²) in the
// slip annulus c < r < a.
const cattaneo = (T: number) => a * Math.cbrt(1 - T / (mu * P));
const qCM = (x: number, c: number) =>
  ((mu * p0) / a) * (Math.sqrt(Math.max(a * a - x * x, 0)) - Math.sqrt(Math.max(c * c - x * x, 0)));

describe('Ciavarella–Jäger partial slip on a closed-form Hertz pressure', () => {
  it.each([0.1, 0.3, 0.5, 0.7, 0.9, 0.999])(
    'stick radius is Cattaneo–Mindlin at T/μP = %s',
    (u) => {
      const m = map(u * mu * P);
      // 2e-12 of a: the stick-force search stops within 1e-12 of P* (a ∝ P^{1/3} moves by a
      // third of that) or a bracket of 1e-12 of a.
      expect(Math.abs(m.stickRadius - cattaneo(u * mu * P))).toBeLessThan(2e-12 * a);
      expect(m.grossSliding).toBe(false);
      expect(m.slipAnnulus).toEqual({ inner: m.stickRadius, outer: a });
    },
  );

  it('traction follows Cattaneo–Mindlin and carries the tangential load', () => {
    const T = 0.6 * mu * P;
    const m = map(T);
    const c = cattaneo(T);
    for (const node of m.nodes) {
      // 2e-10·μp₀: p* is taken at c to 1e-12 a, and near r = c the root √(c² − r²) turns a
      // radius error δ into ≈ √(2cδ); observed ≤ 8e-11 μp₀.
      expect(Math.abs(node.traction - qCM(node.r, c))).toBeLessThan(2e-10 * mu * p0);
      expect(node.state).toBe(node.r >= a ? 'open' : node.r <= c ? 'stick' : 'slip');
      expect(node.traction).toBeLessThanOrEqual(mu * node.pressure);
    }
    // ∫q dA = T (tangential equilibrium), by the trapezoidal rule on 2πr q over the 2001 nodes;
    // the square-root edges at r = c and a cost O(h^{3/2}): observed 7e-6 here (4e-5 at
    // T/μP = 0.1), tolerance 2e-5.
    let integral = 0;
    for (let i = 0; i + 1 < n; i++) {
      const [x0, x1] = [r[i], r[i + 1]];
      const f0 = 2 * Math.PI * x0 * m.nodes[i].traction;
      const f1 = 2 * Math.PI * x1 * m.nodes[i + 1].traction;
      integral += ((f0 + f1) / 2) * (x1 - x0);
    }
    expect(Math.abs(integral / T - 1)).toBeLessThan(2e-5);
  });

  it('slides as a whole exactly when T ≥ μP', () => {
    const limit = mu * P;
    const below = limit - limit * Number.EPSILON; // the largest double under μP, or close to it
    const slides = map(limit);
    expect(slides.grossSliding).toBe(true);
    expect(slides.stickRadius).toBe(0);
    for (const node of slides.nodes) {
      expect(node.state).toBe(node.pressure > 0 ? 'slip' : 'open');
      expect(node.traction).toBe(mu * node.pressure); // q = μp everywhere: exactly limiting
    }
    expect(map(2 * limit).grossSliding).toBe(true);
    const holds = map(below);
    expect(holds.grossSliding).toBe(false);
    expect(holds.utilisation as number).toBeLessThan(1);
  });

  it('sticks everywhere without a tangential load', () => {
    const m = map(0);
    expect(m.stickRadius).toBe(a);
    expect(m.nodes.every((node) => node.traction === 0)).toBe(true);
  });

  it('refuses a negative load or a friction that is not positive', () => {
    expectFieldError(() => map(-1), 'tangentialLoad');
    expectFieldError(() => ciavarellaJager(r, current, (s) => hertz(s, r), a, 1, 0), 'friction');
    expectFieldError(() => map(NaN), 'tangentialLoad');
  });
});
