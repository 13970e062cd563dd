import { pelegRetained } from '@/fem';
import { PLOT_POINTS } from './plot';
import type { RelaxationReading } from './relaxation-csv';

/** The times, s, at which the page states the share of the force still held. */
export const RETAINED_AT_S = [1, 5, 30] as const;
const CURVE_POINTS = 120;

export interface RelaxationPlot {
  /** readings, thinned for drawing: time s, force N */
  measured: { t: number; f: number }[];
  /** Peleg's curve with the test's constants, from 0 to the last reading (or 30 s without one) */
  fitted: { t: number; f: number }[];
  /** the share of F₀ kept after each of RETAINED_AT_S, 0…1 */
  retained: { timeS: number; share: number }[];
}

/** Every n-th reading (and always the last), so a 50 000-row file plots as a few hundred. */
function thin<T>(items: readonly T[], max = PLOT_POINTS): T[] {
  if (items.length <= max) return [...items];
  const step = (items.length - 1) / (max - 1);
  return Array.from({ length: max }, (_, i) => items[Math.round(i * step)]);
}

/** What the page draws and states for a test whose constants were fitted at upload. */
export function relaxationPlot(
  test: { k1S: number; k2: number; f0N: number },
  readings: readonly RelaxationReading[] | null,
): RelaxationPlot {
  const constants = { k1: test.k1S, k2: test.k2 };
  const endS = readings?.at(-1)?.timeS ?? RETAINED_AT_S.at(-1)!;
  const fitted = Array.from({ length: CURVE_POINTS + 1 }, (_, i) => {
    const t = (endS * i) / CURVE_POINTS;
    return { t, f: test.f0N * pelegRetained(t, constants) };
  });
  return {
    measured: thin(readings ?? []).map((r) => ({ t: r.timeS, f: r.forceN })),
    fitted,
    retained: RETAINED_AT_S.map((timeS) => ({ timeS, share: pelegRetained(timeS, constants) })),
  };
}
