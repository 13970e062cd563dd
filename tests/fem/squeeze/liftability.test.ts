import { describe, expect, it } from 'vitest';
import { GRIP_TOLERANCE, runSqueeze, type SqueezeInput } from '../../../fem';

// Inputs invented: 70 mm apple-sized sphere, E = 3 MPa, ν = 0.35; density 840 kg/m³ within
// Mohsenin 1986's 800–850 kg/m³ for apple flesh [memory]; friction 0.4 within the 0.36–0.51 of
// apples on steel/plywood (CIGR Journal [read]).
const g = 9.80665; // standard gravity (CGPM 1901)
const base: SqueezeInput = {
  equatorialRadius: 0.035,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.0015,
  mesh: 'coarse',
  padDiameter: 0.03,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  accelG: 0.5,
  bruiseThreshold: 150e3,
  failureShear: 100e3,
};

// Grip rule 2μN ≥ SF·m(g + a) [practice] (REFERENCES.md), mass of a sphere (4/3)πR³ρ.
const mass = (4 / 3) * Math.PI * 0.035 ** 3 * 840;
const ratioOf = (force: number) => (0.4 * 2 * force) / (2 * mass * g * 1.5);

/** Paths of every number in `v` that is NaN or ±Infinity (JSON.stringify would hide them as null). */
function nonFinite(v: unknown, path = ''): string[] {
  if (typeof v === 'number') return Number.isFinite(v) ? [] : [path];
  if (v && typeof v === 'object') {
    return Object.entries(v).flatMap(([k, x]) => nonFinite(x, `${path}.${k}`));
  }
  return [];
}

describe('liftability of the two-pad grip', () => {
  const res = runSqueeze(base);
  const lift = res.liftability!;

  it('the lift ratio follows the grip rule and never decreases with travel', () => {
    for (const s of res.steps) {
      // 1e-12 relative: the same formula evaluated twice in double precision.
      expect(s.liftRatio as number).toBeCloseTo(ratioOf(s.force), 10);
    }
    for (let i = 1; i < res.steps.length; i++) {
      expect(res.steps[i].liftRatio as number).toBeGreaterThanOrEqual(
        res.steps[i - 1].liftRatio as number,
      );
    }
    expect(lift.mass).toBeCloseTo(mass, 12);
  });

  it('the grip travel is where the ratio reaches 1, within the bisection tolerance', () => {
    const grip = lift.grip!;
    expect(grip).not.toBeNull();
    const tol = GRIP_TOLERANCE * base.travel;
    expect(ratioOf(grip.force)).toBeGreaterThanOrEqual(1);
    // Independent re-runs just below and at the grip travel (one increment each, cold start).
    const below = runSqueeze({ ...base, travel: grip.travel - 2 * tol, steps: 1 }).final;
    const at = runSqueeze({ ...base, travel: grip.travel, steps: 1 }).final;
    expect(ratioOf(below.force)).toBeLessThan(1);
    // The ratio changes by (dF/dd)·tol across the bracket; with F ~ d^1.5 that is < 1e-3 here.
    expect(ratioOf(at.force) - 1).toBeLessThan(1e-3);
    expect(at.force).toBeCloseTo(grip.force, 6);
  });

  it('margins are threshold / peak at the grip point', () => {
    const grip = lift.grip!;
    // Definition (DESIGN.md, squeeze check): bruise margin = threshold / peak pressure.
    expect(grip.bruiseMargin as number).toBeCloseTo(150e3 / grip.peakPressure, 12);
    expect(grip.shearMargin as number).toBeCloseTo(100e3 / (grip.maxShear as number), 12);
    expect(grip.profile.length).toBeGreaterThan(0);
  });

  it('says so, without an error, when the travel never lifts the fruit', () => {
    const weak = runSqueeze({ ...base, friction: 0.01 });
    expect(weak.liftability!.grip).toBeNull();
    expect(weak.liftability!.reason).toMatch(/reaches only/);
    expect(nonFinite(weak)).toEqual([]);
  });
});
