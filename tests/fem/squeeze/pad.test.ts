import { describe, expect, it } from 'vitest';
import { runSqueeze, type SqueezeInput } from '../../../fem';

// Inputs invented: 80 mm sphere, E = 3 MPa, ν = 0.35, 1 mm travel per pad. The flat-plate
// contact radius is then ≈ 6.3 mm by Hertz (worked example, computed from a = √(Rδ), K. L.
// Johnson, Contact Mechanics, Cambridge University Press 1985, §4.2 [from memory]), 6.5 mm in
// the model.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.001,
  mesh: 'balanced',
  steps: 4,
};

describe('pad geometry', () => {
  const plate = runSqueeze(base);

  it('a flat plate matches a pad wider than the contact', () => {
    const wide = runSqueeze({ ...base, padDiameter: 0.06 });
    // Same active set and same gaps inside the contact: identical to round-off (1e-9 relative).
    expect(wide.final.force / plate.final.force).toBeCloseTo(1, 9);
    expect(wide.final.peakPressure / plate.final.peakPressure).toBeCloseTo(1, 9);
    expect(wide.warnings).toEqual([]);
  });

  it('a pad narrower than the contact shows the edge pressure rise', () => {
    // Flat punch with rounded corners: pressure peaks near the edge of the flat, not at the
    // centre (Johnson 1985, §5.2–5.3 [from memory]).
    const small = runSqueeze({ ...base, padDiameter: 0.008, edgeRadius: 0.0005 });
    const prof = small.profile;
    const centre = prof[0].pressure;
    const peak = prof.reduce((b, p) => (p.pressure > b.pressure ? p : b));
    console.log(
      `8 mm pad: centre ${(centre / 1e3).toFixed(0)} kPa, peak ${(peak.pressure / 1e3).toFixed(0)} kPa at r = ${(peak.r * 1e3).toFixed(2)} mm`,
    );
    expect(peak.r).toBeGreaterThan(0.8 * 0.0035); // beyond 80 % of the flat radius D/2 − r_e
    expect(peak.pressure).toBeGreaterThan(1.5 * centre); // a clear rise, not a ripple
    expect(small.final.contactRadius).toBeLessThanOrEqual(0.004); // never past the pad
    expect(small.final.force).toBeLessThan(plate.final.force); // less contact, less force
    expect(small.warnings.map((w) => w.code)).toContain('edge-contact');
    expect(small.warnings.map((w) => w.message).join(' ')).toMatch(/rounded edge/);
  });

  it('warns that a sharp edge gives a mesh-dependent edge pressure', () => {
    const sharp = runSqueeze({ ...base, padDiameter: 0.008, edgeRadius: 0.0001 });
    expect(sharp.warnings.map((w) => w.code)).toContain('sharp-edge');
    expect(sharp.warnings.map((w) => w.message).join(' ')).toMatch(/singular/);
  });
});

describe('compliant facing (an elastic layer in series with the fruit)', () => {
  const rigid = runSqueeze(base);
  it('lowers the peak pressure and spreads the contact', () => {
    const soft = runSqueeze({ ...base, facingModulus: 1e6, facingThickness: 0.003 });
    expect(soft.final.peakPressure).toBeLessThan(rigid.final.peakPressure);
    expect(soft.final.contactRadius).toBeGreaterThan(rigid.final.contactRadius);
  });
  it('tends to the rigid pad as the facing stiffens', () => {
    const gaps = [1e7, 1e8, 1e10].map((Em) => {
      const r = runSqueeze({ ...base, facingModulus: Em, facingThickness: 0.003 });
      return Math.abs(r.final.peakPressure / rigid.final.peakPressure - 1);
    });
    expect(gaps[1]).toBeLessThan(gaps[0]);
    expect(gaps[2]).toBeLessThan(gaps[1]);
    // Layer stiffness per area ≥ E_l/t_l = 3.3e12 Pa/m against a fruit stiffness ~E*/a ≈
    // 5e8 Pa/m: difference ~1e-4.
    expect(gaps[2]).toBeLessThan(1e-3);
  });
});
