import { describe, expect, it } from 'vitest';
import { runSqueeze, squeezeResultJson, type SqueezeInput } from '../../../fem';

// Inputs invented: an 80 mm fruit, E = 3 MPa, ν = 0.35, 1 mm travel, a 20 mm pad with a facing,
// liftability inputs; both models.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.001,
  steps: 3,
  mesh: 'sparse',
  padDiameter: 0.02,
  facingModulus: 2e6,
  facingThickness: 0.002,
  facingPoisson: 0.4,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  bruiseThreshold: 150e3,
  failureShear: 100e3,
};

/** Every key of `v`, at any depth (list entries included). */
function keys(v: unknown): string[] {
  if (Array.isArray(v)) return v.flatMap(keys);
  if (v && typeof v === 'object') {
    return Object.entries(v).flatMap(([k, x]) => (k === 'units' ? [k] : [k, ...keys(x)]));
  }
  return [];
}

/** Paths of numbers that are not finite (JSON.stringify would print them as null). */
function nonFinite(v: unknown, path = ''): string[] {
  if (typeof v === 'number') return Number.isFinite(v) ? [] : [path];
  if (v && typeof v === 'object') {
    return Object.entries(v).flatMap(([k, x]) => nonFinite(x, `${path}.${k}`));
  }
  return [];
}

describe('squeeze result JSON (CLI --json and the API)', () => {
  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    const json = squeezeResultJson(runSqueeze({ ...base, model }));

    it(`names a unit for every key (${model})`, () => {
      const missing = [...new Set(keys(json))].filter((k) => !(k in json.units));
      expect(missing).toEqual([]);
      expect(nonFinite(json)).toEqual([]);
    });

    it(`says per metre where the slice gives per-metre figures (${model})`, () => {
      const all = new Set(keys(json));
      const slice = model === 'plane-strain';
      for (const k of ['force_n', 'mass_kg', 'hold_load_n', 'required_force_n']) {
        expect(all.has(k)).toBe(!slice);
        expect(all.has(`${k}_per_m`)).toBe(slice);
      }
      expect(all.has('contact_half_width_mm')).toBe(slice);
      expect(all.has('travel_per_pad_mm')).toBe(true);
      expect(all.has('bruise_margin')).toBe(true);
      expect(all.has('travel_mm') || all.has('margin')).toBe(false);
    });
  }

  it('rounds for display and keeps the margin a quotient of the figures shown', () => {
    const result = runSqueeze(base);
    const json = squeezeResultJson(result);
    const grip = json.liftability!.grip!;
    const [margin, peak] = [grip.bruise_margin as number, grip.peak_pressure_kpa as number];
    // Product definition: bruise margin = threshold / peak pressure. The margin is shown to 3
    // figures (at most 5e-3 relative off, at 1.00) and the peak to 4 (5e-4): 5.5e-3 in all.
    expect(Math.abs(margin / (150 / peak) - 1)).toBeLessThan(5.5e-3);
    expect(json.warnings).toEqual(result.warnings);
  });
});
