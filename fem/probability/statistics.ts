import { FemInputError } from '../errors';

/** Two-sided 95 % standard normal quantile z = Φ⁻¹(0.975). */
export const Z_95 = 1.959963984540054;

/** A proportion's confidence band [low, high], both in [0, 1]. */
export interface Interval {
  low: number;
  high: number;
}

/**
 * Wilson score interval for k successes in n trials (E. B. Wilson, "Probable inference, the law
 * of succession, and statistical inference", J. Am. Stat. Assoc. 22:209, 1927):
 * (p̂ + z²/2n ± z·√(p̂(1 − p̂)/n + z²/4n²)) / (1 + z²/n). Unlike p̂ ± z·SE it stays inside [0, 1]
 * and is not empty at k = 0 or k = n.
 * @throws FemInputError('trials') unless 0 ≤ k ≤ n are whole numbers and n ≥ 1
 */
export function wilsonInterval(k: number, n: number, z = Z_95): Interval {
  if (!Number.isInteger(n) || n < 1 || !Number.isInteger(k) || k < 0 || k > n) {
    throw new FemInputError(
      'trials',
      'trials must be a whole number ≥ 1 with 0 ≤ successes ≤ trials',
    );
  }
  const p = k / n;
  const z2 = z * z;
  const centre = p + z2 / (2 * n);
  const half = z * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  const scale = 1 + z2 / n;
  return {
    low: k === 0 ? 0 : Math.max(0, (centre - half) / scale),
    high: k === n ? 1 : Math.min(1, (centre + half) / scale),
  };
}

/** Ranks 1..n of `x`, ties sharing the mean of their ranks. */
export function ranks(x: ArrayLike<number>): Float64Array {
  const order = Array.from({ length: x.length }, (_, i) => i).sort((a, b) => x[a] - x[b]);
  const out = new Float64Array(x.length);
  for (let i = 0; i < order.length;) {
    let j = i;
    while (j + 1 < order.length && x[order[j + 1]] === x[order[i]]) j++;
    const mean = (i + j) / 2 + 1;
    for (let m = i; m <= j; m++) out[order[m]] = mean;
    i = j + 1;
  }
  return out;
}

/**
 * Spearman rank correlation of x and y (C. Spearman, Am. J. Psychol. 15:72, 1904): the Pearson
 * correlation of their ranks, ties given mean ranks. Null when either is constant (no ranking)
 * or fewer than two pairs are given.
 */
export function spearman(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  if (x.length !== y.length) throw new FemInputError('y', 'x and y must be of equal length');
  const n = x.length;
  if (n < 2) return null;
  const rx = ranks(x);
  const ry = ranks(y);
  const mean = (n + 1) / 2;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const [a, b] = [rx[i] - mean, ry[i] - mean];
    sxy += a * b;
    sxx += a * a;
    syy += b * b;
  }
  if (sxx === 0 || syy === 0) return null;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}

/** The q-quantile (0 ≤ q ≤ 1) of sorted values, linear between order statistics. */
export function quantileSorted(sorted: ArrayLike<number>, q: number): number {
  const h = (sorted.length - 1) * q;
  const i = Math.floor(h);
  return i + 1 < sorted.length ? sorted[i] + (h - i) * (sorted[i + 1] - sorted[i]) : sorted[i];
}
