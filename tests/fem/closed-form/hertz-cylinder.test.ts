import { describe, expect, it } from 'vitest';
import { effectiveModulus, hertzCylinderPerLength } from '../../../fem/closed-form';
import { expectFieldError, expectRelative } from './expect-close';

describe('hertzCylinderPerLength', () => {
  it('reproduces the worked example: cylinder on a rigid flat', () => {
    // Worked example, computed from the line-contact relations b² = 4P′R/(πE*), p₀ = 2P′/(πb)
    // (K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, §4.3 [section recalled from memory]):
    // E = 3 MPa, ν = 0.35, R = 20 mm, P′ = 200 N/m → b = 1.22 mm, p₀ = 104 kPa.
    // Tolerance 0.5 %: the values are rounded to 3 significant figures.
    const s = hertzCylinderPerLength({
      forcePerLength: 200,
      radius: 0.02,
      effectiveModulus: effectiveModulus(3e6, 0.35),
    });
    expectRelative(s.halfWidth, 1.22e-3, 0.005);
    expectRelative(s.peakPressure, 104e3, 0.005);
  });

  it('carries the applied load: ∫p dx = P′ and p₀ = 2P′/(πb) over several inputs', () => {
    // Elliptical line-contact pressure p₀√(1 − x²/b²) integrates to πbp₀/2 (Johnson 1985, ch. 4);
    // the mean over 2b is then P′/(2b). Round-off only: 1e-12.
    for (const [load, radius, modulus] of [
      [200, 0.02, 3.42e6],
      [5, 0.005, 0.4e6],
      [1e5, 0.01, 115e9],
    ]) {
      const s = hertzCylinderPerLength({ forcePerLength: load, radius, effectiveModulus: modulus });
      expectRelative((Math.PI * s.halfWidth * s.peakPressure) / 2, load, 1e-12);
      expectRelative(s.meanPressure, load / (2 * s.halfWidth), 1e-12);
    }
  });

  it('gives zero contact at zero load', () => {
    const s = hertzCylinderPerLength({ forcePerLength: 0, radius: 0.02, effectiveModulus: 1e6 });
    expect([s.halfWidth, s.peakPressure, s.meanPressure]).toEqual([0, 0, 0]);
  });

  it('rejects bad input naming the field', () => {
    const ok = { forcePerLength: 200, radius: 0.02, effectiveModulus: 3e6 };
    expectFieldError(() => hertzCylinderPerLength({ ...ok, forcePerLength: -1 }), 'forcePerLength');
    expectFieldError(() => hertzCylinderPerLength({ ...ok, radius: 0 }), 'radius');
    expectFieldError(
      () => hertzCylinderPerLength({ ...ok, effectiveModulus: Number.NaN }),
      'effectiveModulus',
    );
  });
});
