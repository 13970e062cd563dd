import { describe, expect, it } from 'vitest';
import { FemConvergenceError, monotoneRoot } from '../../../fem';

/** Wraps f to count its evaluations. */
function counted(f: (x: number) => number) {
  const calls = { n: 0 };
  return { calls, f: (x: number) => (calls.n++, f(x)) };
}

describe('monotoneRoot (Illinois regula falsi on a bracket)', () => {
  it('finds the cube root of 2 as Math.cbrt does', () => {
    // Reference: Math.cbrt (the engine's libm). With fTol 1e-13 on f = x³ the root is off by at
    // most fTol / (3x²) ≈ 2.1e-14 and never below it (the upper end is returned); 3e-14 allows it.
    const x = monotoneRoot(
      (v) => v ** 3,
      2,
      { lo: 1, hi: 2, fLo: 1, fHi: 8 },
      { xTol: 0, fTol: 1e-13 },
    );
    expect(x ** 3).toBeGreaterThanOrEqual(2);
    expect(x - Math.cbrt(2)).toBeGreaterThanOrEqual(0);
    expect(x - Math.cbrt(2)).toBeLessThan(3e-14);
  });

  it('lands on a piecewise-linear root in a few steps where bisection needs forty', () => {
    // Force against travel on a fixed active set is linear; kinks where nodes enter contact.
    // Invented kinks at 0.3 and 0.6 with slopes 1, 3, 6: the target 2.5 lies on the last piece,
    // at 0.6 + (2.5 − 1.2) / 6 exactly (by hand).
    const pw = (x: number) => (x < 0.3 ? x : x < 0.6 ? 0.3 + 3 * (x - 0.3) : 1.2 + 6 * (x - 0.6));
    const { f, calls } = counted(pw);
    const x = monotoneRoot(
      f,
      2.5,
      { lo: 0, hi: 1, fLo: 0, fHi: 3.6 },
      { xTol: 1e-12, fTol: 1e-12 },
    );
    // 1e-12 in force over the slope 6: the root is found within 1.7e-13; 1e-12 allows it.
    expect(Math.abs(x - (0.6 + 1.3 / 6))).toBeLessThan(1e-12);
    // Bisection to a 1e-12 bracket of [0, 1] takes ⌈log2 1e12⌉ = 40 evaluations.
    expect(calls.n).toBeLessThanOrEqual(10);
  });

  it('keeps converging on a function flat at one end (the halving moves the stuck end)', () => {
    // x^20 on [0, 1] with target 0.5: plain regula falsi creeps from the flat end; the root is
    // 0.5^(1/20) (Math.pow as reference), tolerance as the first case: fTol / f'(x) ≈ 1e-12 / 19.
    const { f, calls } = counted((v) => v ** 20);
    const x = monotoneRoot(f, 0.5, { lo: 0, hi: 1, fLo: 0, fHi: 1 }, { xTol: 0, fTol: 1e-12 });
    expect(x).toBeGreaterThanOrEqual(0.5 ** (1 / 20));
    expect(x - 0.5 ** (1 / 20)).toBeLessThan(1e-13);
    expect(calls.n).toBeLessThan(60);
  });

  it('returns the upper end at once when it is already close enough', () => {
    const { f, calls } = counted((v) => v);
    expect(monotoneRoot(f, 1, { lo: 0, hi: 1, fLo: 0, fHi: 1 }, { xTol: 0, fTol: 0 })).toBe(1);
    expect(calls.n).toBe(0);
  });

  it('throws a convergence error when a jump can never meet the tolerance', () => {
    // A step at 0.5: the value at the upper end stays 1 above the target 0, and xTol 0 is never
    // met once the bracket is two adjacent doubles.
    const step = (v: number) => (v < 0.5 ? -1 : 1);
    expect(() =>
      monotoneRoot(step, 0, { lo: 0, hi: 1, fLo: -1, fHi: 1 }, { xTol: 0, fTol: 0 }),
    ).toThrow(FemConvergenceError);
  });
});
