import { describe, expect, it } from 'vitest';
import { hertzEllipticalAtApproach, hertzSphereAtApproach } from '../../../fem/closed-form';
import { ellipticKAndDeficit } from '../../../fem/closed-form/hertz-elliptical';
import { expectFieldError, expectRelative } from './expect-close';

/** Trapezoid rule over [0, π/2] (spectrally accurate for these smooth periodic integrands). */
function quarterPeriod(f: (theta: number) => number, n = 20_000): number {
  const h = Math.PI / 2 / n;
  let sum = (f(0) + f(Math.PI / 2)) / 2;
  for (let i = 1; i < n; i++) sum += f(i * h);
  return sum * h;
}

/**
 * Surface deflection (times E*) at (x0, y0) under p₀√(1 − x²/a² − y²/b²) by Boussinesq,
 * u = (1/(πE*))∬p/r dA (Johnson, Contact Mechanics, 1985, ch. 3 [from memory]); the radial integral
 * about (x0, y0) is done in closed form, the angular one by the trapezoid rule.
 */
function deflection(p0: number, a: number, b: number, x0: number, y0: number): number {
  const n = 4000;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n;
    const gamma = Math.cos(t) ** 2 / a ** 2 + Math.sin(t) ** 2 / b ** 2;
    const beta = (x0 * Math.cos(t)) / a ** 2 + (y0 * Math.sin(t)) / b ** 2;
    const alpha = 1 - x0 ** 2 / a ** 2 - y0 ** 2 / b ** 2;
    const centre = -beta / gamma;
    const half = Math.sqrt(alpha / gamma + centre ** 2);
    const phi0 = Math.asin(-centre / half);
    sum += Math.sqrt(gamma) * half ** 2 * (Math.PI / 4 - phi0 / 2 - Math.sin(2 * phi0) / 4);
  }
  return (p0 * sum * ((2 * Math.PI) / n)) / Math.PI;
}

describe('ellipticKAndDeficit', () => {
  it('matches quadrature of K(e) and E(e)', () => {
    // K = ∫dθ/√(1 − e²sin²θ), E = ∫√(1 − e²sin²θ)dθ over [0, π/2] (Abramowitz & Stegun 1964,
    // 17.3 [from memory]). Tolerance 1e-10: both sides are converged far beyond it.
    for (const q of [1, 0.9, 0.5, 0.1, 0.01]) {
      const m = 1 - q * q;
      const k = quarterPeriod((t) => 1 / Math.sqrt(1 - m * Math.sin(t) ** 2));
      const e = quarterPeriod((t) => Math.sqrt(1 - m * Math.sin(t) ** 2));
      const got = ellipticKAndDeficit(q);
      expectRelative(got.k, k, 1e-10);
      expect(Math.abs(got.s - (k - e) / k)).toBeLessThanOrEqual(1e-10);
    }
  });
});

describe('hertzEllipticalAtApproach', () => {
  it('reduces to the sphere for equal radii, continuously', () => {
    // Hertz sphere relations (Johnson 1985, ch. 4). Equal radii: round-off only (1e-12);
    // radii 1e-9 apart: the state may move by about that much (1e-8).
    const sphere = hertzSphereAtApproach({ approach: 1e-3, radius: 0.04, effectiveModulus: 3e6 });
    for (const [radii, tolerance] of [
      [[0.04, 0.04], 1e-12],
      [[0.04, 0.04 * (1 + 1e-9)], 1e-8],
    ] as const) {
      const s = hertzEllipticalAtApproach({ radii, effectiveModulus: 3e6, approach: 1e-3 });
      expectRelative(s.force, sphere.force, tolerance);
      expectRelative(s.semiMajorAxis, sphere.contactRadius, tolerance);
      expectRelative(s.semiMinorAxis, sphere.contactRadius, tolerance);
      expectRelative(s.peakPressure, sphere.peakPressure, tolerance);
    }
  });

  it('produces a pressure whose Boussinesq deflection fits both bodies exactly', () => {
    // Independent check of the whole solution: the ellipsoidal pressure must deflect the surface
    // by δ at the centre and by δ − x²/(2R′) − y²/(2R″) inside the contact (Johnson 1985, ch. 3–4
    // [from memory]). The quadrature is done here, spectrally convergent; tolerance 1e-9 relative.
    for (const radii of [
      [0.03, 0.06],
      [0.2, 0.02],
      [0.01, 0.5],
    ] as const) {
      const approach = 1e-4;
      const s = hertzEllipticalAtApproach({ radii, effectiveModulus: 1, approach });
      const { peakPressure: p0, semiMajorAxis: a, semiMinorAxis: b } = s;
      expectRelative(deflection(p0, a, b, 0, 0), approach, 1e-9);
      const alongMajor = (approach - deflection(p0, a, b, 0.5 * a, 0)) / (0.5 * a) ** 2;
      const alongMinor = (approach - deflection(p0, a, b, 0, 0.6 * b)) / (0.6 * b) ** 2;
      expectRelative(alongMajor, 1 / (2 * Math.max(...radii)), 1e-9);
      expectRelative(alongMinor, 1 / (2 * Math.min(...radii)), 1e-9);
      // Force of the ellipsoidal pressure, (2/3)πab p₀ (Johnson 1985, ch. 4); round-off only.
      expectRelative(s.force, (2 / 3) * Math.PI * a * b * p0, 1e-12);
    }
  });

  it("agrees with Johnson's approximations for contact size and approach", () => {
    // Johnson 1985 §4.2 [from memory]: with R_e = √(R′R″), c = √(ab) = (3FR_e/(4E*))^(1/3)·F₁ and
    // δ = (9F²/(16E*²R_e))^(1/3)·F₂, F₁ = 1 − ((R″/R′)^0.0602 − 1)^1.456,
    // F₂ = 1 − ((R″/R′)^0.0684 − 1)^1.531. They are curve fits; we allow 1 %.
    for (const ratio of [1.5, 2, 4, 10, 20, 50]) {
      const radii = [0.01, 0.01 * ratio] as const;
      const approach = 1e-4;
      const s = hertzEllipticalAtApproach({ radii, effectiveModulus: 1, approach });
      const re = 0.01 * Math.sqrt(ratio);
      const f1 = 1 - (ratio ** 0.0602 - 1) ** 1.456;
      const f2 = 1 - (ratio ** 0.0684 - 1) ** 1.531;
      const c = Math.sqrt(s.semiMajorAxis * s.semiMinorAxis);
      expectRelative(c, Math.cbrt((3 * s.force * re) / 4) * f1, 0.01);
      expectRelative(approach, Math.cbrt((9 * s.force ** 2) / (16 * re)) * f2, 0.01);
    }
  });

  it('rejects bad input naming the field', () => {
    const ok = { radii: [0.03, 0.05] as const, effectiveModulus: 3e6, approach: 1e-3 };
    expectFieldError(() => hertzEllipticalAtApproach({ ...ok, radii: [0.03, 0] }), 'radii');
    expectFieldError(() => hertzEllipticalAtApproach({ ...ok, radii: [1e-7, 1] }), 'radii');
    expectFieldError(
      () => hertzEllipticalAtApproach({ ...ok, radii: [0.03] as unknown as [number, number] }),
      'radii',
    );
    expectFieldError(() => hertzEllipticalAtApproach({ ...ok, approach: -1 }), 'approach');
    expectFieldError(
      () => hertzEllipticalAtApproach({ ...ok, effectiveModulus: 0 }),
      'effectiveModulus',
    );
  });
});
