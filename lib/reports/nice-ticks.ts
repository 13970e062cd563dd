/**
 * Axis ticks at round values, by Heckbert's loose labelling ("Nice numbers for graph labels",
 * Graphics Gems, 1990): the step is 1, 2 or 5 × a power of ten, and the axis runs from a multiple
 * of the step at or below the data to one at or above it.
 */

/** A "nice" number near x: 1, 2, 5 or 10 × 10^k, rounded or taken at or above x. */
export function niceNumber(x: number, round: boolean): number {
  const exp = Math.floor(Math.log10(x));
  const f = x / 10 ** exp;
  const nice = round
    ? f < 1.5
      ? 1
      : f < 3
        ? 2
        : f < 7
          ? 5
          : 10
    : f <= 1
      ? 1
      : f <= 2
        ? 2
        : f <= 5
          ? 5
          : 10;
  return nice * 10 ** exp;
}

export interface NiceAxis {
  min: number;
  max: number;
  step: number;
  ticks: number[];
}

/**
 * About `count` ticks spanning [lo, hi]; each tick is rounded to the step's decimals, so no
 * 0.30000000000000004 reaches a label. A flat or empty range gets one step around its value.
 */
export function niceTicks(lo: number, hi: number, count = 5): NiceAxis {
  let a = Number.isFinite(lo) ? lo : 0;
  let b = Number.isFinite(hi) ? hi : 1;
  if (a > b) [a, b] = [b, a];
  if (a === b) {
    const pad = a === 0 ? 1 : Math.abs(a) / 2;
    a -= pad;
    b += pad;
  }
  const range = niceNumber(b - a, false);
  const step = niceNumber(range / Math.max(1, count - 1), true);
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  const min = Math.floor(a / step) * step;
  const max = Math.ceil(b / step) * step;
  const ticks: number[] = [];
  for (let t = min; t <= max + step / 2; t += step) ticks.push(Number(t.toFixed(decimals)));
  return { min: ticks[0], max: ticks[ticks.length - 1], step, ticks };
}
