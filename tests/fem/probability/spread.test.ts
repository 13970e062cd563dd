import { erf } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { randomStream, samplerOf } from '../../../fem';
import { expectFieldError } from '../closed-form/expect-close';

const n = 50_000;
const draw = (value: (z: number) => number) => {
  const s = randomStream(3);
  return Array.from({ length: n }, () => value(s.normal()));
};
const mean = (x: number[]) => x.reduce((a, b) => a + b, 0) / x.length;
const sd = (x: number[]) => Math.sqrt(mean(x.map((v) => v * v)) - mean(x) ** 2);
// Share of a normal within ±2σ: erf(2/√2) = 0.9545 (mathjs erf).
const within2 = erf(Math.SQRT2) as number;
const inside = (x: number[], lo: number, hi: number) =>
  x.filter((v) => v >= lo && v <= hi).length / x.length;
// Binomial standard error of that share at n samples; tolerance 4 of them.
const shareTol = 4 * Math.sqrt((within2 * (1 - within2)) / n);

describe('spreads of the inputs', () => {
  it('a standard deviation of a positive input is a log-normal with that mean and sd', () => {
    const x = draw(samplerOf('modulus', 3e6, { sd: 0.9e6 }).value);
    expect(Math.min(...x)).toBeGreaterThan(0);
    // Standard errors: sd/√n for the mean, sd·√((κ − 1)/4n) for the sample sd, κ the kurtosis;
    // for a log-normal κ − 3 = e^{4s²} + 2e^{3s²} + 3e^{2s²} − 6 with s² = ln(1 + cv²) (N. L.
    // Johnson, S. Kotz, N. Balakrishnan, Continuous Univariate Distributions, vol. 1, 1994,
    // ch. 14 [from memory]). Tolerance 4 standard errors each.
    const s2 = Math.log(1 + 0.3 ** 2);
    const kurtosis = 3 + Math.exp(4 * s2) + 2 * Math.exp(3 * s2) + 3 * Math.exp(2 * s2) - 6;
    expect(Math.abs(mean(x) - 3e6)).toBeLessThan((4 * 0.9e6) / Math.sqrt(n));
    expect(Math.abs(sd(x) - 0.9e6)).toBeLessThan(4 * 0.9e6 * Math.sqrt((kurtosis - 1) / (4 * n)));
  });

  it('a range of a positive input holds 95.4 % of the samples, geometric mean in the middle', () => {
    const x = draw(samplerOf('density', 800, { low: 700, high: 900 }).value);
    expect(Math.abs(inside(x, 700, 900) - within2)).toBeLessThan(shareTol);
    const median = [...x].sort((a, b) => a - b)[n / 2];
    // The median of a log-normal is exp(μ) = √(low·high); its standard error is about
    // 1.25·σ_x/√n (asymptotic variance of a sample median [from memory]), σ_x ≈ 50 here.
    expect(Math.abs(median - Math.sqrt(700 * 900))).toBeLessThan((4 * 1.25 * 50) / Math.sqrt(n));
  });

  it("Poisson's ratio stays inside (0, 0.5), however wide the spread", () => {
    const wide = draw(samplerOf('poisson', 0.45, { sd: 0.2 }).value);
    expect(Math.min(...wide)).toBeGreaterThan(0);
    expect(Math.max(...wide)).toBeLessThan(0.5);
    const range = draw(samplerOf('poisson', 0.3, { low: 0.25, high: 0.45 }).value);
    expect(Math.abs(inside(range, 0.25, 0.45) - within2)).toBeLessThan(shareTol);
    // Small sd: a normal of that sd about ν₀ to first order (delta method). To second order the
    // mean moves by ½ν''(y)s² with ν = logistic(y)/2, ν'' = t(1 − t)(1 − 2t)/2 at t = 2ν₀ and
    // s = sd/(t(1 − t)/2): −8.3e-5 here. Tolerance 4 standard errors, 0.01/√n for the mean and
    // 0.01/√(2n) for the sd.
    const narrow = draw(samplerOf('poisson', 0.3, { sd: 0.01 }).value);
    const t = 0.6;
    const s = 0.01 / ((t * (1 - t)) / 2);
    const shift = 0.5 * ((t * (1 - t) * (1 - 2 * t)) / 2) * s * s;
    expect(Math.abs(mean(narrow) - (0.3 + shift))).toBeLessThan((4 * 0.01) / Math.sqrt(n));
    expect(Math.abs(sd(narrow) - 0.01)).toBeLessThan((4 * 0.01) / Math.sqrt(2 * n));
  });

  it('zero spread gives the nominal value exactly', () => {
    const none = samplerOf('friction', 0.4, { sd: 0 });
    expect(none.varies).toBe(false);
    expect(none.value(1.7)).toBe(0.4);
    expect(samplerOf('size', 0.04, { low: 0.035, high: 0.035 }).value(-2)).toBe(0.035);
    expect(samplerOf('size', 0.04).value(3)).toBe(0.04);
  });

  it('names the field of a bad spread', () => {
    expectFieldError(() => samplerOf('modulus', 3e6, { sd: -1 }), 'spreads.modulus.sd');
    expectFieldError(() => samplerOf('modulus', 3e6, { sd: NaN }), 'spreads.modulus.sd');
    expectFieldError(() => samplerOf('size', 0.04, { low: 0.05, high: 0.03 }), 'spreads.size.high');
    expectFieldError(() => samplerOf('density', 800, { low: 0, high: 900 }), 'spreads.density.low');
    expectFieldError(
      () => samplerOf('poisson', 0.3, { low: 0.2, high: 0.5 }),
      'spreads.poisson.high',
    );
    expectFieldError(() => samplerOf('poisson', 0, { sd: 0.01 }), 'spreads.poisson.sd');
    const both = { sd: 1, low: 1, high: 2 } as unknown as { sd: number };
    expectFieldError(() => samplerOf('friction', 0.4, both), 'spreads.friction');
  });
});
