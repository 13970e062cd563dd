import { describe, expect, it } from 'vitest';
import { runSqueeze, sweepPadDiameters, type SqueezeInput } from '../../../fem';

// Inputs invented: 80 mm sphere, E = 3 MPa, ν = 0.35; liftability as in liftability.test.ts.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.002,
  mesh: 'sparse',
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  accelG: 1,
  bruiseThreshold: 150e3,
};

describe('margin versus pad diameter', () => {
  const diameters = [0.005, 0.008, 0.012, 0.03, 0.05];
  const sweep = sweepPadDiameters(base, diameters);

  it('agrees with a single squeeze run at each diameter', () => {
    sweep.forEach((p, i) => {
      const one = runSqueeze({ ...base, padDiameter: diameters[i] }).liftability!.grip!;
      // Same computation path (identical increments and grip search): equal to round-off.
      expect(p.bruiseMargin as number).toBeCloseTo(one.bruiseMargin as number, 9);
      expect(p.gripTravel as number).toBeCloseTo(one.travel, 12);
    });
  });

  it('small pads concentrate the load; pads wider than the contact act as a plate', () => {
    const m = sweep.map((p) => p.bruiseMargin as number);
    expect(m[0]).toBeLessThan(m[1]);
    expect(m[1]).toBeLessThan(m[2]);
    // Grip contact (≈ 4 mm radius) fits on the flat of both the 30 and 50 mm pads: same result.
    expect(m[4] / m[3]).toBeCloseTo(1, 9);
    const plate = runSqueeze(base).liftability!.grip!;
    expect(m[4] / (plate.bruiseMargin as number)).toBeCloseTo(1, 9);
  });
});
