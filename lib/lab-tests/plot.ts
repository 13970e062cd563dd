import type { CompressionFit } from './fit';
import type { CurvePoint } from './parse-curve';

/** At most this many measured points go to the chart: enough to draw, little to send. */
export const PLOT_POINTS = 400;
const CURVE_POINTS = 60;

export interface PlotSeries {
  measured: { d: number; f: number }[];
  fitted: { d: number; f: number }[];
}

/** Every n-th reading (and always the last), so a 50 000-row file plots as a few hundred. */
export function thinPoints(points: readonly CurvePoint[], max = PLOT_POINTS): CurvePoint[] {
  if (points.length <= max) return [...points];
  const step = (points.length - 1) / (max - 1);
  return Array.from({ length: max }, (_, i) => points[Math.round(i * step)]);
}

/** The measured curve and the fitted Hertz curve F = slope · D^(3/2) over the fitted range. */
export function plotSeries(points: readonly CurvePoint[], fit: CompressionFit): PlotSeries {
  const measured = thinPoints(points).map((p) => ({ d: p.displacementMm, f: p.forceN }));
  const fitted = Array.from({ length: CURVE_POINTS + 1 }, (_, i) => {
    const d = (fit.toMm * i) / CURVE_POINTS;
    return { d, f: fit.slope * d ** 1.5 };
  });
  return { measured, fitted };
}
