import { describe, expect, it } from 'vitest';
import { lusolve, multiply, transpose } from 'mathjs';
import { fitPeleg, pelegRetained, pelegTimeToShare, runSqueeze } from '../../../fem';

// Peleg M., "Characterization of the stress relaxation curves of solid foods", J. Food Science
// 44:277–281, 1979: F(t) = F₀ (1 − t/(k₁ + k₂ t)), linearised as F₀ t/(F₀ − F) = k₁ + k₂ t.

describe("Peleg's relaxation", () => {
  it('retained share and time to a share, worked by hand', () => {
    // k₁ = 10 s, k₂ = 1.5: at 10 s, 1 − 10/(10 + 15) = 0.6; the asymptote is 1 − 1/1.5 = 1/3.
    const c = { k1: 10, k2: 1.5 };
    expect(pelegRetained(0, c)).toBe(1);
    expect(pelegRetained(10, c)).toBeCloseTo(0.6, 12);
    expect(pelegRetained(1e9, c)).toBeCloseTo(1 / 3, 6);
    // Inverse: 0.6 is reached at 10 s (s = 0.4: 0.4·10/(1 − 0.6) = 10); 0.3 is below the
    // asymptote and never reached. Tolerance 1e-12: closed forms, round-off only.
    expect(pelegTimeToShare(0.6, c)).toBeCloseTo(10, 12);
    expect(pelegTimeToShare(0.3, c)).toBeNull();
    expect(pelegTimeToShare(1, c)).toBe(0);
  });

  it('a fit recovers the constants of a relaxation curve, as an independent solver does', () => {
    // Readings from k₁ = 12 s, k₂ = 1.6, F₀ = 40 N, with ±0.3 % alternating error (a load cell's
    // order). The fit's line is checked against mathjs solving the normal equations of the same
    // linearised data (an independent linear solver): agreement to 1e-9 relative.
    const truth = { k1: 12, k2: 1.6 };
    const t = [0, 1, 2, 4, 8, 15, 30, 60, 120, 240];
    const f = t.map(
      (x, i) => 40 * pelegRetained(x, truth) * (i === 0 ? 1 : 1 + (i % 2 ? 3e-3 : -3e-3)),
    );
    const fit = fitPeleg(t, f);
    const rows = t.slice(1).map((x) => [1, x]);
    const y = t.slice(1).map((x, i) => [(x * 40) / (40 - f[i + 1])]);
    const At = transpose(rows);
    const sol = lusolve(multiply(At, rows), multiply(At, y)) as number[][];
    expect(Math.abs(fit.k1 / sol[0][0] - 1)).toBeLessThan(1e-9);
    expect(Math.abs(fit.k2 / sol[1][0] - 1)).toBeLessThan(1e-9);
    // Against the truth: within 5 % for k₁ and 1 % for k₂ — the 0.3 % force error is magnified
    // in F₀ − F at the first seconds, where the line's intercept k₁ is set.
    expect(Math.abs(fit.k1 / truth.k1 - 1)).toBeLessThan(0.05);
    expect(Math.abs(fit.k2 / truth.k2 - 1)).toBeLessThan(0.01);
    expect(fit.r2Force).toBeGreaterThan(0.99);
    expect(fit.points).toBe(9);
  });

  it('refuses readings it cannot fit, in words', () => {
    expect(() => fitPeleg([0, 1, 2], [1, 0.9, 0.8])).toThrow(/four readings/);
    expect(() => fitPeleg([0, 2, 1, 3], [1, 0.9, 0.8, 0.7])).toThrow(/must increase/);
    expect(() => fitPeleg([1, 2, 3, 4], [1, 0.9, 0.8, 0.7])).toThrow(/t = 0/);
    expect(() => fitPeleg([0, 1, 2, 3], [1, 1, 1.1, 1])).toThrow(/nothing relaxes/);
  });
});

describe('a held grip follows the relaxation modulus (Lee & Radok 1960)', () => {
  // Lee E.H. & Radok J.R.M., "The contact problem for viscoelastic bodies", J. Appl. Mech.
  // 27:438–444, 1960: under a displacement applied at once and held, the viscoelastic contact
  // force is the elastic one with E(t) (constant ν, contact area not shrinking). For a Hertz
  // sphere that is F(t) = (4/3)·E(t)/(1 − ν²)·√R·δ^(3/2) (Johnson, Contact Mechanics, 1985,
  // ch. 4 and §6.5). A standard linear solid E(t) = E∞ + (E₀ − E∞)·e^(−t/τ), inputs invented.
  const R = 0.035;
  const nu = 0.3;
  const d = 0.0004;
  const E0 = 4e6;
  const Einf = 1.6e6;
  const tau = 5;
  const E = (t: number) => Einf + (E0 - Einf) * Math.exp(-t / tau);
  const hertz = (t: number) => (4 / 3) * (E(t) / (1 - nu * nu)) * Math.sqrt(R) * d ** 1.5;
  const fe = (modulus: number) =>
    runSqueeze({ equatorialRadius: R, modulus, poisson: nu, travel: d, mesh: 'balanced', steps: 1 })
      .final;

  it('the model force at held travel scales with E(t), as the closed form does', () => {
    const first = fe(E0);
    for (const t of [1, 5, 20]) {
      const at = fe(E(t));
      // Homogeneity in E: same travel, same contact (the active set does not depend on E for a
      // fixed ν), force × E(t)/E₀. Tolerance 1e-9 relative: the same linear solve, scaled.
      expect(Math.abs(at.force / (first.force * (E(t) / E0)) - 1)).toBeLessThan(1e-9);
      expect(Math.abs(at.contactRadius / first.contactRadius - 1)).toBeLessThan(1e-9);
      // Against the viscoelastic Hertz closed form: the model's force over Hertz's is the same
      // at every t (1e-9), and that ratio is the finite sphere's stiffening over Hertz's
      // half-space at this travel, 4–7 % (a/R ≈ 0.1; the Hertz squeeze tests measure 1.043 at
      // 0.25 mm and 1.065 at 0.5 mm on a 40 mm sphere).
      const ratio = at.force / hertz(t);
      expect(Math.abs(ratio / (first.force / hertz(0)) - 1)).toBeLessThan(1e-9);
      expect(ratio).toBeGreaterThan(1.03);
      expect(ratio).toBeLessThan(1.08);
    }
  });
});
