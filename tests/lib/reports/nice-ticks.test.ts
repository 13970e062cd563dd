import { describe, expect, it } from 'vitest';
import { niceNumber, niceTicks } from '@/lib/reports/nice-ticks';

// Expected ticks worked by hand with Heckbert's loose labelling ("Nice numbers for graph
// labels", Graphics Gems, 1990): range = nice(hi − lo), step = nice(range ÷ 4, rounded).
describe('nice ticks', () => {
  it("puts the issue's unrounded axes on round ticks", () => {
    // 0–63.3: range nice(63.3) = 100, step nice(25) = 20 → 0, 20 … 80.
    expect(niceTicks(0, 63.3).ticks).toEqual([0, 20, 40, 60, 80]);
    // 0–5.51: range 10, step nice(2.5) = 2 → 0, 2, 4, 6.
    expect(niceTicks(0, 5.51).ticks).toEqual([0, 2, 4, 6]);
    // 0–0.00394 (a US axis in inches): range 0.005, step 0.001.
    expect(niceTicks(0, 0.00394).ticks).toEqual([0, 0.001, 0.002, 0.003, 0.004]);
  });

  it('gives ticks free of binary round-off and covering the data', () => {
    const axis = niceTicks(0.1, 0.7);
    expect(axis.ticks).toEqual([0, 0.2, 0.4, 0.6, 0.8]);
    expect(axis.min).toBeLessThanOrEqual(0.1);
    expect(axis.max).toBeGreaterThanOrEqual(0.7);
  });

  it('spreads a flat range around its value', () => {
    expect(niceTicks(3, 3).ticks).toEqual([1, 2, 3, 4, 5]);
    expect(niceTicks(0, 0).ticks).toEqual([-1, -0.5, 0, 0.5, 1]);
  });

  it('rounds to 1, 2, 5 or 10 times a power of ten', () => {
    expect(niceNumber(0.0037, true)).toBeCloseTo(0.005, 15);
    expect(niceNumber(140, true)).toBe(100);
    expect(niceNumber(140, false)).toBe(200);
    expect(niceNumber(7, true)).toBe(10);
  });
});
