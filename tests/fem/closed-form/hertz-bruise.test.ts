import { describe, expect, it } from 'vitest';
import {
  hertzBruiseRadius,
  hertzForceForBruiseRadius,
  hertzSphereAtForce,
  onsetContactRadius,
} from '@/fem';

// Two 35 mm-radius fruit (R = 17.5 mm) with E* = 1 MPa and a 100 kPa threshold. Worked by hand:
// a_t = π·0.0175·1e5/(2·1e6) = 2.7489 mm; at a = 5 mm, b = √(25 − 7.5565) = 4.1765 mm; the force
// for a = 5 mm is 4·1e6·0.005³/(3·0.0175) = 9.5238 N. Tolerance 1e-4 relative: hand rounding.
const bodies = { radius: 0.0175, effectiveModulus: 1e6 };
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('the region of a Hertz contact above a pressure threshold', () => {
  it('matches the hand calculation', () => {
    expect(rel(onsetContactRadius(bodies, 1e5), 2.7489e-3)).toBeLessThan(1e-4);
    expect(rel(hertzBruiseRadius(bodies, 0.005, 1e5), 4.1765e-3)).toBeLessThan(1e-4);
    expect(rel(hertzForceForBruiseRadius(bodies, 1e5, 4.1765e-3), 9.5238)).toBeLessThan(1e-4);
  });

  it('at its edge the Hertz pressure p₀√(1 − r²/a²) equals the threshold (Johnson 1985, eq. 4.25)', () => {
    // The contact state comes from hertzSphereAtForce, tested against Johnson's closed forms on
    // its own; the bruise edge is checked against the pressure profile, not against itself.
    for (const force of [2, 14, 60]) {
      const s = hertzSphereAtForce({ ...bodies, force });
      const b = hertzBruiseRadius(bodies, s.contactRadius, 1e5);
      const p = s.peakPressure * Math.sqrt(1 - (b / s.contactRadius) ** 2);
      expect(rel(p, 1e5)).toBeLessThan(1e-9);
      // And the force that gives that bruise is the force we started from.
      expect(rel(hertzForceForBruiseRadius(bodies, 1e5, b), force)).toBeLessThan(1e-9);
    }
  });

  it('is zero up to the onset and grows from it', () => {
    const onsetForce = hertzForceForBruiseRadius(bodies, 1e5, 0);
    const below = hertzSphereAtForce({ ...bodies, force: 0.9 * onsetForce });
    expect(below.peakPressure).toBeLessThan(1e5);
    expect(hertzBruiseRadius(bodies, below.contactRadius, 1e5)).toBe(0);
    const above = hertzSphereAtForce({ ...bodies, force: 1.1 * onsetForce });
    expect(hertzBruiseRadius(bodies, above.contactRadius, 1e5)).toBeGreaterThan(0);
  });
});
