import { erf } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { randomStream, splitMix64, xoshiro128ss } from '../../../fem';
import { expectFieldError } from '../closed-form/expect-close';

describe('seeded generators', () => {
  it('SplitMix64 gives the published sequence for seed 1234567', () => {
    // Rosetta Code, task "Pseudo-random numbers/Splitmix64" [from memory]: the first five outputs.
    const next = splitMix64(1234567n);
    expect(Array.from({ length: 5 }, next)).toEqual([
      6457827717110365317n,
      3203168211198807973n,
      9817491932198370423n,
      4593380528125082431n,
      16408922859458223821n,
    ]);
  });

  it('xoshiro128** follows the reference algorithm from the state (1, 2, 3, 4)', () => {
    // Worked by hand from Blackman & Vigna's reference xoshiro128starstar.c (ACM TOMS 47(4):36,
    // 2021): out = rotl(s1·5, 7)·9, then t = s1 << 9; s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3;
    // s2 ^= t; s3 = rotl(s3, 11). Step 1: rotl(10, 7)·9 = 11520, state → (7, 0, 1026, 12288).
    // Step 2: s1 = 0 gives 0, state → (12295, 1029, 1029, 25165824). Step 3: rotl(5145, 7)·9
    // = 658560·9 = 5927040.
    const next = xoshiro128ss([1, 2, 3, 4]);
    expect([next(), next(), next()]).toEqual([11520, 0, 5927040]);
    expectFieldError(() => xoshiro128ss([0, 0, 0, 0]), 'state');
  });

  it('the same seed gives the same stream, different seeds differ', () => {
    const draw = (seed: number) => {
      const s = randomStream(seed);
      return Array.from({ length: 8 }, () => [s.uniform(), s.normal()]).flat();
    };
    expect(draw(42)).toEqual(draw(42));
    expect(draw(42)).not.toEqual(draw(43));
    expectFieldError(() => randomStream(-1), 'seed');
    expectFieldError(() => randomStream(1.5), 'seed');
  });

  it('uniforms and normals have the right moments and distribution', () => {
    const n = 100_000;
    const s = randomStream(7);
    const u = Array.from({ length: n }, () => s.uniform());
    const z = Array.from({ length: n }, () => s.normal());
    expect(Math.min(...u)).toBeGreaterThan(0);
    expect(Math.max(...u)).toBeLessThan(1);
    const mean = (x: number[]) => x.reduce((a, b) => a + b, 0) / x.length;
    // Sample means within 4 standard errors: √(1/12n) for U(0, 1), √(1/n) for N(0, 1).
    expect(Math.abs(mean(u) - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    expect(Math.abs(mean(z))).toBeLessThan(4 / Math.sqrt(n));
    // Sample variance of N(0, 1): standard error √(2/n).
    const v = mean(z.map((x) => x * x)) - mean(z) ** 2;
    expect(Math.abs(v - 1)).toBeLessThan(4 * Math.sqrt(2 / n));
    // Kolmogorov–Smirnov distance to Φ(x) = (1 + erf(x/√2))/2 (mathjs erf): below the 1 %
    // critical value 1.628/√n of Kolmogorov's limit law [from memory].
    const sorted = [...z].sort((a, b) => a - b);
    let d = 0;
    sorted.forEach((x, i) => {
      const F = (1 + erf(x / Math.SQRT2)) / 2;
      d = Math.max(d, Math.abs(F - i / n), Math.abs(F - (i + 1) / n));
    });
    expect(d).toBeLessThan(1.628 / Math.sqrt(n));
  });
});
