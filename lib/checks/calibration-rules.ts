import type { Observation } from '@/lib/properties/quantities';

/**
 * How a prediction is judged against a published outcome: the rule in words beside the
 * decision, so the calibration page states its tolerance with every row. Pure.
 */
export interface Judgement {
  agrees: boolean;
  rule: string;
}

/**
 * A drop check's no-bruise height estimate against a published drop figure, by its kind:
 * - a no-bruise height or a handling guide's maximum: the estimate within a factor of 2 either
 *   way — the scatter of drop thresholds between lots and seasons of one cultivar [common
 *   practice];
 * - a height at which fruit bruised (an upper bound): the estimate at or below it, and not more
 *   than 4 times lower (below that the estimate says nothing the figure does not).
 */
export function judgeDrop(
  observation: Observation,
  publishedMm: number,
  onsetMm: number,
): Judgement {
  const r = onsetMm / publishedMm;
  if (observation === 'bruised-at')
    return {
      agrees: r <= 1 && r >= 0.25,
      rule: 'at or below the height at which fruit bruised, and not 4× lower',
    };
  return { agrees: r >= 0.5 && r <= 2, rule: 'within a factor of 2 of the published height' };
}

/** A figure against a published range widened by a stated share either side. */
export function judgeRange(value: number, low: number, high: number, widen: number): Judgement {
  return {
    agrees: value >= low * (1 - widen) && value <= high * (1 + widen),
    rule: `within the published range, widened by ${Math.round(widen * 100)} % either side`,
  };
}

/** A count (of fruit layers, say) against a published span, within a factor either way. */
export function judgeFactor(value: number, low: number, high: number, factor: number): Judgement {
  return {
    agrees: value >= low / factor && value <= high * factor,
    rule: `within a factor of ${factor} of the published ${low}–${high}`,
  };
}
