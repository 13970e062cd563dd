import { describe, expect, it } from 'vitest';
import { effectiveModulus, effectiveRadius } from '../../../fem/closed-form';
import { expectFieldError, expectRelative } from './expect-close';

describe('effectiveModulus', () => {
  it('gives the worked-example E* = 3.42 MPa for E = 3 MPa, ν = 0.35 on a rigid flat', () => {
    // Worked example, computed from 1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂ (K. L. Johnson, Contact Mechanics, Cambridge University Press 1985,
    // §4.2 [from memory]): 3 MPa / (1 − 0.35²) = 3.42 MPa. Tolerance 0.5 %: rounded to 3 figures.
    expectRelative(effectiveModulus(3e6, 0.35), 3.42e6, 0.005);
    expectRelative(effectiveModulus(3e6, 0.35, Infinity, 0.2), 3.42e6, 0.005);
  });

  it('halves E* for two identical bodies and is symmetric in the bodies', () => {
    // 1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂ (Johnson 1985, ch. 4): two equal terms double the
    // compliance. Tolerance 1e-12: only round-off separates the two sides.
    const rigid = effectiveModulus(210e9, 0.3);
    expectRelative(effectiveModulus(210e9, 0.3, 210e9, 0.3), rigid / 2, 1e-12);
    expectRelative(
      effectiveModulus(3e6, 0.35, 2e6, 0.45),
      effectiveModulus(2e6, 0.45, 3e6, 0.35),
      1e-12,
    );
  });

  it('tends to the rigid counterface as the second modulus grows', () => {
    // Limit E₂ → ∞ of the same relation; at E₂/E₁ = 1e9 the difference is ≈ 1e-9 relative.
    expectRelative(effectiveModulus(3e6, 0.35, 3e15, 0.3), effectiveModulus(3e6, 0.35), 1e-8);
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(() => effectiveModulus(0, 0.3), 'modulus1');
    expectFieldError(() => effectiveModulus(Number.NaN, 0.3), 'modulus1');
    expectFieldError(() => effectiveModulus(3e6, 0.5), 'poisson1');
    expectFieldError(() => effectiveModulus(3e6, 0.3, -1, 0.3), 'modulus2');
    expectFieldError(() => effectiveModulus(3e6, 0.3, 3e6), 'poisson2');
  });
});

describe('effectiveRadius', () => {
  it('is R₁ on a flat and R/2 for two equal spheres', () => {
    // 1/R = 1/R₁ + 1/R₂ (Johnson 1985, ch. 4). Tolerance 1e-12: round-off only.
    expect(effectiveRadius(0.04)).toBe(0.04);
    expect(effectiveRadius(0.04, Infinity)).toBe(0.04);
    expectRelative(effectiveRadius(0.04, 0.04), 0.02, 1e-12);
    expectRelative(1 / effectiveRadius(0.03, 0.05), 1 / 0.03 + 1 / 0.05, 1e-12);
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(() => effectiveRadius(-0.01), 'radius1');
    expectFieldError(() => effectiveRadius(0.01, 0), 'radius2');
    expectFieldError(() => effectiveRadius(0.01, -Infinity), 'radius2');
  });
});
