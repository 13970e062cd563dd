import { describe, expect, it } from 'vitest';
import {
  bandCentre,
  gripMargin,
  runMonteCarlo,
  runMonteCarloAsync,
  type MonteCarloInput,
  type SqueezeInput,
} from '../../../fem';
import { designSamples, sampleInput } from '../../../fem/probability/mc-samples';
import { validateSqueezeInput } from '../../../fem';
import { expectFieldError } from '../closed-form/expect-close';

// Inputs invented (as in monte-carlo.test.ts): 80 mm sphere, E = 3 MPa, ν = 0.35, 30 mm pads.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.002,
  steps: 20,
  mesh: 'sparse',
  padDiameter: 0.03,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  bruiseThreshold: 150e3,
};
const input: MonteCarloInput = {
  base,
  spreads: { modulus: { sd: 0.6e6 }, poisson: { low: 0.3, high: 0.4 }, friction: { sd: 0.05 } },
  samples: 40,
  seed: 9,
};

describe('Monte Carlo runs', () => {
  it('reports progress, and a cancelled run is the prefix of the full one', () => {
    const fractions: number[] = [];
    const full = runMonteCarlo(input, { chunk: 10, onProgress: (f) => fractions.push(f) });
    expect(fractions).toEqual([0.25, 0.5, 0.75, 1]);
    expect(full.cancelled).toBe(false);
    const signal = { aborted: false };
    const part = runMonteCarlo(input, {
      chunk: 10,
      signal,
      onProgress: (f) => (signal.aborted = f >= 0.5),
    });
    expect(part.cancelled).toBe(true);
    expect(part.completed).toBe(20);
    // Samples run in draw order, so the 20 done are exactly the run of 20 samples.
    const first = runMonteCarlo({ ...input, samples: 20 });
    expect({ ...part, samples: 20, cancelled: false }).toEqual(first);
  });

  it('runs asynchronously to the same answer', async () => {
    const fractions: number[] = [];
    const r = await runMonteCarloAsync(input, { chunk: 20, onProgress: (f) => fractions.push(f) });
    expect(r).toEqual(runMonteCarlo(input));
    expect(fractions).toEqual([0.5, 1]);
  });

  it("runs a Poisson band's samples on one body with E* kept, close to their own ν", () => {
    const r = runMonteCarlo(input);
    for (const nu of r.poissonBands) expect(bandCentre(nu, 0.02)).toBe(nu);
    expect(r.poissonBands.length).toBeLessThanOrEqual(8);
    // The Hertz pressure at a given force depends on E* = E/(1 − ν²) only (Johnson, Contact
    // Mechanics, 1985, ch. 4), so a band keeps each sample's E*; the finite body's own ν
    // dependence is what remains: observed ≤ 7.5e-4 of the margin on the sparse mesh over
    // ν = 0.2–0.5 with bands of 0.02, tolerance 1.5e-3.
    for (const nu of [0.301, 0.339, 0.36, 0.409]) {
      const own = gripMargin({ ...base, poisson: nu }).margin as number;
      const nb = bandCentre(nu, 0.02);
      const modulus = (base.modulus * (1 - nb * nb)) / (1 - nu * nu);
      const banded = gripMargin({ ...base, poisson: nb, modulus }).margin as number;
      expect(Math.abs(banded / own - 1)).toBeLessThan(1.5e-3);
    }
  });

  it('keeps the aspect exact when the size varies, so the body cache is hit', () => {
    const spheroid = { ...base, axialRadius: 0.052 };
    const nominal = validateSqueezeInput(spheroid);
    const design = designSamples(spheroid, nominal, { size: { sd: 0.004 } }, 0.02);
    for (let i = 0; i < 200; i++) {
      const R = 0.03 + i * 1.37e-4;
      const s = sampleInput(design, {
        modulus: 3e6,
        poisson: 0.35,
        size: R,
        density: 840,
        friction: 0.4,
        bruiseThreshold: 150e3,
      });
      expect((s.axialRadius as number) / s.equatorialRadius).toBe(nominal.aspect);
      // The radius is moved by at most 1e-12 of itself to find an exact ratio.
      expect(Math.abs(s.equatorialRadius / R - 1)).toBeLessThan(1e-12);
    }
  });

  it('counts the samples the travel does not lift apart', () => {
    const r = runMonteCarlo({
      base: { ...base, travel: 0.0004, steps: 4 },
      spreads: { friction: { low: 0.15, high: 0.6 } },
      samples: 60,
      seed: 4,
    });
    expect(r.notLifted).toBeGreaterThan(0);
    expect(r.lifted).toBeGreaterThan(0);
    expect(r.lifted + r.notLifted + r.skipped).toBe(60);
    expect(r.notLiftedProbability).toBeCloseTo(r.notLifted / 60, 15);
  });

  it('names the field of a bad input', () => {
    expectFieldError(() => runMonteCarlo({ ...input, samples: 0 }), 'samples');
    expectFieldError(() => runMonteCarlo({ ...input, samples: 2.5 }), 'samples');
    expectFieldError(() => runMonteCarlo({ ...input, seed: -3 }), 'seed');
    expectFieldError(() => runMonteCarlo({ ...input, poissonBand: 0 }), 'poissonBand');
    expectFieldError(
      () => runMonteCarlo({ ...input, base: { ...base, bruiseThreshold: undefined } }),
      'bruiseThreshold',
    );
    expectFieldError(
      () => runMonteCarlo({ ...input, base: { ...base, density: undefined, friction: undefined } }),
      'density',
    );
    expectFieldError(
      () => runMonteCarlo({ ...input, spreads: { modulus: { sd: -1 } } }),
      'spreads.modulus.sd',
    );
    expectFieldError(() => runMonteCarlo(input, { chunk: 0 }), 'chunk');
    expectFieldError(() => runMonteCarlo({ ...input, base: { ...base, modulus: -1 } }), 'modulus');
  });
});
