import { describe, expect, it } from 'vitest';
import { parseRelaxationCsv } from '@/lib/lab-tests/relaxation-csv';
import { fitRelaxation } from '@/lib/lab-tests/relaxation-fit';
import { relaxationPlot } from '@/lib/lab-tests/relaxation-plot';
import { PELEG, pelegCsv, type PelegCurve } from '../../support/peleg-curve';

const fitOf = (curve: PelegCurve) =>
  fitRelaxation(parseRelaxationCsv(new TextEncoder().encode(pelegCsv(curve))).readings);
const relative = (x: number, exact: number) => Math.abs(x / exact - 1);

describe("Peleg's fit of a generated relaxation curve", () => {
  it('gives back k₁, k₂ and F₀ of a curve without noise', () => {
    // Forces are written to 6 decimals: a rounding of at most 5e-7 N against a drop F₀ − F of at
    // least 1.7 N (t = 0.5 s) moves each t·F₀ ÷ (F₀ − F) by under 3e-7 of itself, so 1e-5 of
    // k₁ and k₂ is thirty times what rounding can do.
    const fit = fitOf(PELEG);
    expect(relative(fit.k1, 8)).toBeLessThan(1e-5);
    expect(relative(fit.k2, 1.6)).toBeLessThan(1e-5);
    expect(fit.f0).toBe(30);
    // 240 readings after t = 0 each enter the linear form (F < F₀ for all of them).
    expect(fit.points).toBe(240);
    expect(fit.r2Linear).toBeGreaterThan(1 - 1e-9);
    expect(fit.r2Force).toBeGreaterThan(1 - 1e-9);
  });

  it('is within 5 % (k₁) and 1 % (k₂) of the inputs with ±0.05 N noise, for several seeds', () => {
    // The noise (uniform ±0.05 N, 0.17 % of F₀) enters mostly through F₀, the first reading,
    // which every point of the linear form divides by: a 0.05 N slip in F₀ moves t·F₀ ÷ (F₀ − F)
    // by about 0.1 % at the end of the hold (F₀ − F ≈ 18 N), so k₂ by about that, and k₁ (the
    // intercept, extrapolated from a mean time of 60 s) by about 0.1 % × 1.6 × 60 s ≈ 0.1 s,
    // 1.2 % of 8 s; per-reading noise adds about 0.4 %. 5 % and 1 % leave room for both, yet a
    // unit slip (ms read as s, a thousandfold) or k₁ and k₂ swapped fails them by far.
    for (const seed of [1, 2, 3, 42, 2026]) {
      const fit = fitOf({ ...PELEG, noise: 0.05, seed });
      expect([seed, relative(fit.k1, 8) < 0.05]).toEqual([seed, true]);
      expect([seed, relative(fit.k2, 1.6) < 0.01]).toEqual([seed, true]);
      // R² of the force curve: residuals of ≈0.03 N against a spread of several N.
      expect(fit.r2Force).toBeGreaterThan(0.999);
    }
  });

  it('states the share kept after 1, 5 and 30 s from the constants', () => {
    // 1 − t ÷ (k₁ + k₂·t) with k₁ = 8 s, k₂ = 1.6, by hand: 1 − 1/9.6, 1 − 5/16, 1 − 30/56.
    // Plain arithmetic on exact inputs: 1e-12 allows only floating-point rounding.
    const plot = relaxationPlot({ k1S: 8, k2: 1.6, f0N: 30 }, null);
    const shares = plot.retained.map((r) => [r.timeS, r.share]);
    const expected = [
      [1, 0.8958333333333334],
      [5, 0.6875],
      [30, 0.4642857142857143],
    ];
    shares.forEach(([t, share], i) => {
      expect(t).toBe(expected[i][0]);
      expect(Math.abs(share - expected[i][1])).toBeLessThan(1e-12);
    });
    // Without readings the fitted curve runs to 30 s and starts at F₀.
    expect(plot.fitted[0]).toEqual({ t: 0, f: 30 });
    expect(plot.fitted.at(-1)!.t).toBe(30);
    expect(plot.measured).toEqual([]);
  });

  it('thins a long file to at most 400 points to draw, keeping the first and the last', () => {
    const { readings } = parseRelaxationCsv(
      new TextEncoder().encode(pelegCsv({ ...PELEG, step: 0.01, end: 100 })),
    );
    const plot = relaxationPlot({ k1S: 8, k2: 1.6, f0N: 30 }, readings);
    expect(readings).toHaveLength(10_001);
    expect(plot.measured).toHaveLength(400);
    expect(plot.measured[0].t).toBe(0);
    expect(plot.measured.at(-1)!.t).toBe(100);
    expect(plot.fitted.at(-1)!.t).toBe(100);
  });
});
