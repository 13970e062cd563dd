import { describe, expect, it } from 'vitest';
import { roundedPadOnSphere, sneddonAtForce, sneddonAtRadius, type Profile } from './sneddon';

// Checks of the test reference itself, against closed forms outside the project.
const E = 3.4e6; // E* of the invented flesh, Pa
const rel = (x: number, y: number) => Math.abs(x / y - 1);

describe('Sneddon reference (Int. J. Eng. Sci. 3, 1965, 47)', () => {
  it('gives Hertz for a sphere', () => {
    // h = r²/2R: a² = Rδ, P = 4E*a³/3R, p = (2E*/πR)√(a² − r²) (Johnson, Contact Mechanics,
    // 1985, ch. 4). Tolerance 1e-9: Gauss–Legendre on smooth integrands, round-off only.
    const R = 0.04;
    const sphere: Profile = { slope: (r) => r / R, curvature: () => 1 / R, kinks: [] };
    const a = 0.005;
    const s = sneddonAtRadius(sphere, a, E);
    expect(rel(s.approach, (a * a) / R)).toBeLessThan(1e-9);
    expect(rel(s.force, (4 * E * a ** 3) / (3 * R))).toBeLessThan(1e-9);
    for (const r of [0, 0.002, 0.0045]) {
      expect(rel(s.pressure(r), ((2 * E) / (Math.PI * R)) * Math.sqrt(a * a - r * r))).toBeLessThan(
        1e-9,
      );
    }
    expect(rel(sneddonAtForce(sphere, s.force, E, 0.02).contactRadius, a)).toBeLessThan(1e-9);
  });

  it('gives the closed form of a flat punch with a parabolic rounding', () => {
    // h = (r − b)²/2ρ past the flat radius b: Sneddon's two integrals in closed form (worked
    // example, computed from δ = a∫h'/√(a² − r²) dr and P = 2E*∫r²h'/√(a² − r²) dr with the
    // standard antiderivatives of r^k/√(a² − r²)):
    //   δ = (a/ρ)[√(a² − b²) − b·acos(b/a)],
    //   P = (2E*/ρ)[(4a² − b²)√(a² − b²)/6 − (a²b/2)·acos(b/a)].
    // The corner's curvature jump at b is a kink of the integrand, split there; tolerance 1e-9.
    const [b, rho, a] = [0.003, 0.002, 0.0036];
    const parabolic: Profile = {
      slope: (r) => (r > b ? (r - b) / rho : 0),
      curvature: (r) => (r > b ? 1 / rho : 0),
      kinks: [b],
    };
    const s = sneddonAtRadius(parabolic, a, E);
    const root = Math.sqrt(a * a - b * b);
    const acos = Math.acos(b / a);
    expect(rel(s.approach, (a / rho) * (root - b * acos))).toBeLessThan(1e-9);
    expect(
      rel(s.force, ((2 * E) / rho) * (((4 * a * a - b * b) * root) / 6 - ((a * a * b) / 2) * acos)),
    ).toBeLessThan(1e-9);
  });

  it('puts the pressure peak of a rounded pad just past the flat', () => {
    // Flat punch with rounded corners: the pressure peaks near the end of the flat (Johnson
    // 1985, §5.2–5.3 [from memory]); here a = 3.44 mm on a 3 mm flat with a 2 mm edge.
    const s = sneddonAtRadius(roundedPadOnSphere(0.5, 0.005, 0.002), 0.00344, E);
    const rs = Array.from({ length: 345 }, (_, i) => i * 1e-5);
    const peakAt = rs.reduce((best, r) => (s.pressure(r) > s.pressure(best) ? r : best), 0);
    expect(peakAt).toBeGreaterThan(0.003);
    expect(peakAt).toBeLessThan(0.00344);
    expect(s.pressure(peakAt)).toBeGreaterThan(2 * s.pressure(0));
  });
});
