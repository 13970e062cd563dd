import { corr } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { quantileSorted, spearman, wilsonInterval } from '../../../fem';
import { expectFieldError } from '../closed-form/expect-close';

describe('Wilson score interval', () => {
  // R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison of
  // seven methods", Stat. Med. 17:857, 1998, Table II, score method [from memory], printed to
  // four decimals: tolerance 5e-5, half the last digit.
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0, 0.1611],
    [1, 29, 0.0061, 0.1718],
    [29, 29, 0.883, 1],
  ])('%i of %i', (k, n, low, high) => {
    const w = wilsonInterval(k, n);
    expect(Math.abs(w.low - low)).toBeLessThan(5e-5);
    expect(Math.abs(w.high - high)).toBeLessThan(5e-5);
  });

  it('refuses impossible counts', () => {
    expectFieldError(() => wilsonInterval(3, 2), 'trials');
    expectFieldError(() => wilsonInterval(0, 0), 'trials');
    expectFieldError(() => wilsonInterval(1.5, 4), 'trials');
  });
});

describe('Spearman rank correlation', () => {
  it('matches the worked example of IQ against hours of television', () => {
    // Wikipedia, "Spearman's rank correlation coefficient", example [from memory]: ten people,
    // Σd² = 194, ρ = 1 − 6·194/(10·99) = −29/165. Tolerance 1e-15: a few roundings.
    const iq = [106, 100, 86, 101, 99, 103, 97, 113, 112, 110];
    const tv = [7, 27, 2, 50, 28, 29, 20, 12, 6, 17];
    expect(Math.abs((spearman(iq, tv) as number) + 29 / 165)).toBeLessThan(1e-15);
  });

  it('with ties, equals the Pearson correlation (mathjs corr) of mid-ranks', () => {
    const x = [3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 5];
    const y = [2, 7, 1, 8, 2, 8, 1, 8, 2, 8, 4];
    // Mid-rank by definition: 1 + (number below) + (number equal − 1)/2.
    const midRank = (v: number[]) =>
      v.map((a) => 1 + v.filter((b) => b < a).length + (v.filter((b) => b === a).length - 1) / 2);
    const expected = corr(midRank(x), midRank(y)) as number;
    // 1e-14: two summation orders of the same eleven terms.
    expect(Math.abs((spearman(x, y) as number) - expected)).toBeLessThan(1e-14);
  });

  it('is ±1 for monotone data and null for a constant', () => {
    expect(spearman([1, 2, 3, 4], [1, 8, 27, 64])).toBe(1);
    expect(spearman([1, 2, 3, 4], [4, 3, 2, 1])).toBe(-1);
    expect(spearman([1, 2, 3], [5, 5, 5])).toBeNull();
    expect(spearman([1], [2])).toBeNull();
  });
});

describe('quantiles', () => {
  it('interpolate linearly between order statistics', () => {
    // Hyndman & Fan (Am. Stat. 50:361, 1996) definition 7, the default of R: for 1..10,
    // h = 9q, so q = 0.05 → 1.45, q = 0.5 → 5.5, q = 0.95 → 9.55 (computed from the definition).
    const x = Array.from({ length: 10 }, (_, i) => i + 1);
    expect(quantileSorted(x, 0.05)).toBeCloseTo(1.45, 12);
    expect(quantileSorted(x, 0.5)).toBeCloseTo(5.5, 12);
    expect(quantileSorted(x, 0.95)).toBeCloseTo(9.55, 12);
    expect(quantileSorted(x, 1)).toBe(10);
  });
});
