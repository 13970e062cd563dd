import { FemConvergenceError } from '../errors';

/** A bracket of a non-decreasing function f: f(lo) < target ≤ f(hi). */
export interface RootBracket {
  lo: number;
  hi: number;
  fLo: number;
  fHi: number;
}

/** Stopping rule: the bracket narrower than `xTol`, or f(hi) − target at most `fTol`. */
export interface RootTolerance {
  xTol: number;
  fTol: number;
}

/**
 * Least x of a bracket with f(x) ≥ target, for a continuous non-decreasing f, by the Illinois
 * variant of regula falsi (M. Dowell and P. Jarratt, "A modified regula falsi method for
 * computing the root of an equation", BIT 11:168–174, 1971 [from memory]): the secant of the
 * bracket ends, with the value at an end kept twice in a row halved so that end moves too. The
 * contact force is piecewise linear in travel (linear elasticity on a fixed active set), so the
 * secant lands on the root within an active set in one or two steps where bisection needs forty.
 * A secant point outside the open bracket falls back to the midpoint. Returns the upper end, so
 * the point found always reaches the target.
 * @throws FemConvergenceError if 200 steps do not meet the tolerance
 */
export function monotoneRoot(
  f: (x: number) => number,
  target: number,
  bracket: RootBracket,
  { xTol, fTol }: RootTolerance,
): number {
  let { lo, hi } = bracket;
  let gHi = bracket.fHi - target;
  // secant values at the ends: f − target, the Illinois halving applied
  let sLo = bracket.fLo - target;
  let sHi = gHi;
  let kept: 'lo' | 'hi' | null = null;
  for (let i = 0; i < 200; i++) {
    if (hi - lo <= xTol || gHi <= fTol) return hi;
    let x = hi - (sHi * (hi - lo)) / (sHi - sLo);
    if (!(x > lo && x < hi)) x = (lo + hi) / 2;
    const g = f(x) - target;
    if (g >= 0) {
      hi = x;
      gHi = sHi = g;
      if (kept === 'lo') sLo /= 2;
      kept = 'lo';
    } else {
      lo = x;
      sLo = g;
      if (kept === 'hi') sHi /= 2;
      kept = 'hi';
    }
  }
  throw new FemConvergenceError('root search did not meet its tolerance in 200 steps');
}
