import { describe, expect, it } from 'vitest';
import {
  effectiveModulus,
  effectiveRadius,
  hertzSphereAtApproach,
  hertzSphereAtForce,
  hertzSubsurfaceShear,
} from '../../../fem/closed-form';
import { expectFieldError, expectRelative } from './expect-close';

// Illustrative inputs of the worked examples (invented, not data): E = 3 MPa, ν = 0.35.
const E = 3e6;
const NU = 0.35;
// The worked-example values are rounded to 3 significant figures: 0.5 % relative covers that.
const TABLE = 0.005;

describe('hertzSphereAtForce', () => {
  it('reproduces the worked example: sphere on a rigid flat', () => {
    // Worked example, computed from the Hertz point-contact relations a = (3FR/4E*)^(1/3),
    // p₀ = 3F/(2πa²), δ = a²/R (K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, §4.2 [section recalled from memory]):
    // R = 40 mm, F = 20 N → a = 5.60 mm, p₀ = 305 kPa, δ = 0.784 mm.
    const s = hertzSphereAtForce({
      force: 20,
      radius: 0.04,
      effectiveModulus: effectiveModulus(E, NU),
    });
    expectRelative(s.contactRadius, 5.6e-3, TABLE);
    expectRelative(s.peakPressure, 305e3, TABLE);
    expectRelative(s.approach, 0.784e-3, TABLE);
    // Mean pressure is 2p₀/3 and equals F/(πa²) (Johnson 1985, ch. 4); round-off only.
    expectRelative(s.meanPressure, 20 / (Math.PI * s.contactRadius ** 2), 1e-12);
  });

  it('reproduces the worked example: two identical deformable spheres', () => {
    // Worked example, computed from the same relations with 1/R = 1/R₁ + 1/R₂ and
    // 1/E* = Σ(1 − ν²)/E (Johnson 1985, §4.2 [from memory]): R₁ = R₂ = 40 mm, F = 20 N →
    // a = 5.60 mm, p₀ = 305 kPa, δ = 1.57 mm (twice the flat case: R and E* both halve).
    const s = hertzSphereAtForce({
      force: 20,
      radius: effectiveRadius(0.04, 0.04),
      effectiveModulus: effectiveModulus(E, NU, E, NU),
    });
    expectRelative(s.contactRadius, 5.6e-3, TABLE);
    expectRelative(s.peakPressure, 305e3, TABLE);
    expectRelative(s.approach, 1.57e-3, TABLE);
  });

  it('steel ball on a steel flat: a = 0.440 mm, p₀ = 1.23 GPa at E = 200 GPa; scales to 210 GPa', () => {
    // Worked example, computed from the Hertz relations (Johnson 1985, §4.2 [from memory]):
    // D = 50 mm, F = 500 N, E = 200 GPa, ν = 0.3 → a = 0.440 mm, p₀ ≈ 1.23 GPa (0.5 %: three
    // figures). At 210 GPa a ∝ E*^(−1/3) and p₀ ∝ E*^(2/3) give a ≈ 0.434 mm, p₀ ≈ 1.27 GPa
    // (round-off only, 1e-12).
    const at = (modulus: number) =>
      hertzSphereAtForce({
        force: 500,
        radius: 0.025,
        effectiveModulus: effectiveModulus(modulus, 0.3, modulus, 0.3),
      });
    const s200 = at(200e9);
    expectRelative(s200.contactRadius, 0.44e-3, TABLE);
    expectRelative(s200.peakPressure, 1.23e9, TABLE);
    const s210 = at(210e9);
    expectRelative(s210.contactRadius, s200.contactRadius * (200 / 210) ** (1 / 3), 1e-12);
    expectRelative(s210.peakPressure, s200.peakPressure * (210 / 200) ** (2 / 3), 1e-12);
  });

  it('gives a zero state at zero force', () => {
    const s = hertzSphereAtForce({ force: 0, radius: 0.04, effectiveModulus: 1e6 });
    expect([s.contactRadius, s.peakPressure, s.meanPressure, s.approach]).toEqual([0, 0, 0, 0]);
  });
});

describe('hertzSphereAtApproach', () => {
  it('inverts hertzSphereAtForce over several inputs', () => {
    // Both directions use the Hertz relations of Johnson 1985, ch. 4; a round trip must close
    // to round-off (1e-12 relative).
    for (const [force, radius, modulus] of [
      [20, 0.04, 3.42e6],
      [0.5, 0.012, 0.4e6],
      [500, 0.025, 115e9],
      [3, 0.08, 2.2e6],
    ]) {
      const byForce = hertzSphereAtForce({ force, radius, effectiveModulus: modulus });
      const back = hertzSphereAtApproach({
        approach: byForce.approach,
        radius,
        effectiveModulus: modulus,
      });
      expectRelative(back.force, force, 1e-12);
      expectRelative(back.contactRadius, byForce.contactRadius, 1e-12);
      expectRelative(back.peakPressure, byForce.peakPressure, 1e-12);
      // p₀ = 3F/(2πa²) (Johnson 1985, ch. 4), evaluated independently here.
      expectRelative(
        back.peakPressure,
        (3 * force) / (2 * Math.PI * back.contactRadius ** 2),
        1e-12,
      );
    }
  });

  it('rejects bad input naming the field', () => {
    const ok = { radius: 0.04, effectiveModulus: 3e6 };
    expectFieldError(() => hertzSphereAtApproach({ ...ok, approach: -1e-3 }), 'approach');
    expectFieldError(() => hertzSphereAtApproach({ ...ok, approach: Number.NaN }), 'approach');
    expectFieldError(() => hertzSphereAtForce({ ...ok, force: Infinity }), 'force');
    expectFieldError(() => hertzSphereAtForce({ ...ok, force: 1, radius: 0 }), 'radius');
    expectFieldError(
      () => hertzSphereAtForce({ ...ok, force: 1, effectiveModulus: -3 }),
      'effectiveModulus',
    );
  });
});

describe('hertzSubsurfaceShear', () => {
  it('finds ≈ 0.31 p₀ at ≈ 0.48 a for ν = 0.3', () => {
    // Johnson, Contact Mechanics, 1985, §3.4 [from memory]: max shear 0.31 p₀ at depth 0.48 a.
    // Tolerance ±0.005 (absolute, in units of p₀ and a): half a unit of the two recalled figures.
    const p0 = 305e3;
    const a = 5.6e-3;
    const s = hertzSubsurfaceShear(p0, a, 0.3);
    expect(Math.abs(s.maxShear / p0 - 0.31)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(s.depth / a - 0.48)).toBeLessThanOrEqual(0.005);
  });

  it('is the maximum of a brute-force scan of the axis stresses', () => {
    // Independent dense scan of Johnson 1985 eq. 3.45 [from memory] over 0 < z/a ≤ 3 (step 1e-5):
    // the optimiser must not be beaten by more than the scan's own resolution (1e-9 of p₀).
    for (const nu of [0.05, 0.2, 0.3, 0.45]) {
      let best = 0;
      for (let i = 1; i <= 300_000; i++) {
        const z = i * 1e-5;
        const sz = -1 / (1 + z * z);
        const sr = -(1 + nu) * (1 - z * Math.atan(1 / z)) + 0.5 / (1 + z * z);
        best = Math.max(best, 0.5 * Math.abs(sz - sr));
      }
      const found = hertzSubsurfaceShear(1, 1, nu).maxShear;
      expect(found).toBeGreaterThanOrEqual(best - 1e-9);
      expect(found).toBeLessThanOrEqual(best + 1e-9);
    }
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(() => hertzSubsurfaceShear(0, 1e-3, 0.3), 'peakPressure');
    expectFieldError(() => hertzSubsurfaceShear(1e5, -1e-3, 0.3), 'contactRadius');
    expectFieldError(() => hertzSubsurfaceShear(1e5, 1e-3, 0.6), 'poisson');
  });
});
