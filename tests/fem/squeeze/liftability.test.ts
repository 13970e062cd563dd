import { describe, expect, it } from 'vitest';
import { GRIP_TOLERANCE, runSqueeze, type SqueezeInput } from '../../../fem';

// Inputs invented: 70 mm apple-sized sphere, E = 3 MPa, ν = 0.35; density 840 kg/m³, within the
// 800–850 kg/m³ for apple flesh in N. N. Mohsenin, Physical Properties of Plant and Animal
// Materials, Gordon and Breach, 2nd ed. 1986 [from memory]; friction 0.4, a typical value for
// fruit skin on steel or plastic [common practice].
const g = 9.80665; // standard gravity g_n, m/s² (3rd CGPM, 1901)
const base: SqueezeInput = {
  equatorialRadius: 0.035,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.0015,
  mesh: 'sparse',
  padDiameter: 0.03,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  accelG: 0.5,
  bruiseThreshold: 150e3,
  failureShear: 100e3,
};

// Two-pad friction grip rule 2μN ≥ SF·m(g + a) [common practice]; mass of a sphere (4/3)πR³ρ.
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
      // 1e-10 (toBeCloseTo 10 on ratios of order 1): the same formula in double precision.
      expect(s.liftRatio as number).toBeCloseTo(ratioOf(s.force), 10);
    }
    for (let i = 1; i < res.steps.length; i++) {
      expect(res.steps[i].liftRatio as number).toBeGreaterThanOrEqual(
        res.steps[i - 1].liftRatio as number,
      );
    }
    // Mass ≈ 0.15 kg from the same formula: 1e-12 kg is round-off.
    expect(lift.mass).toBeCloseTo(mass, 12);
  });

  it('the grip travel is where the ratio reaches 1, within the search tolerance', () => {
    const grip = lift.grip!;
    expect(grip).not.toBeNull();
    const tol = GRIP_TOLERANCE * base.travel;
    expect(ratioOf(grip.force)).toBeGreaterThanOrEqual(1);
    // Independent re-runs just below and at the grip travel (one increment each, cold start), on
    // the mesh the grip was found on (the run regrades for a grip contact with few nodes).
    const meshContactRadius = (res.gripMesh ?? res.mesh).gradedContactRadius;
    const rerun = (travel: number) =>
      runSqueeze({ ...base, travel, steps: 1, meshContactRadius }).final;
    const below = rerun(grip.travel - 2 * tol);
    const at = rerun(grip.travel);
    expect(ratioOf(below.force)).toBeLessThan(1);
    // The ratio changes by (dF/dd)·tol across the bracket; with F ~ d^1.5 that is < 1e-3 here.
    expect(ratioOf(at.force) - 1).toBeLessThan(1e-3);
    // The grip's own solve at that travel warm-starts from the bracketing increment, the re-run
    // starts cold; the active set is unique, so the forces (≈ 5.6 N) agree to far below 1e-6 N.
    expect(at.force).toBeCloseTo(grip.force, 6);
  });

  it('margins are threshold / peak at the grip point', () => {
    const grip = lift.grip!;
    // Product definition: bruise margin = threshold / peak pressure, shear margin = failure
    // shear / largest shear. Tolerance 1e-12 (toBeCloseTo 12 on margins ≈ 1): one division.
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
