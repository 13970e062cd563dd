import type { SpreadInput } from './spread';
import { quantileSorted, spearman, wilsonInterval, type Interval } from './statistics';

/** How one sample came out (codes of SampleRecord.status). */
export const SampleStatus = { Pending: 0, Lifted: 1, NotLifted: 2, Skipped: 3 } as const;

/** An input that drives the margin: Spearman rank correlation of its samples with the margin. */
export interface Driver {
  input: SpreadInput;
  /** in [−1, 1]; negative: a larger input lowers the margin (raises the bruising risk) */
  spearman: number;
}

/** The statistics of the samples run so far (see MonteCarloResult). */
export interface SampleSummary {
  lifted: number;
  notLifted: number;
  skipped: number;
  bruised: number;
  probability: number | null;
  confidence: Interval | null;
  notLiftedProbability: number | null;
  notLiftedConfidence: Interval | null;
  margin: { p05: number; median: number; p95: number } | null;
  drivers: Driver[];
}

/** Sampled inputs and outcomes of a run; entries past `done` are not yet run. */
export interface SampleRecord {
  done: number;
  status: Uint8Array;
  margin: Float64Array;
  values: Record<SpreadInput, Float64Array>;
  varied: SpreadInput[];
}

/**
 * Summarises the first `done` samples: P(margin < 1) among the lifted ones with its Wilson 95 %
 * band, the share not lifted with its band, margin quantiles (5 %, 50 %, 95 %; linear between
 * order statistics, R. J. Hyndman, Y. Fan, Am. Stat. 50:361, 1996, definition 7) and the varied
 * inputs ranked by |Spearman ρ| with the margin.
 */
export function summarise(rec: SampleRecord): SampleSummary {
  const lifted: number[] = [];
  let notLifted = 0;
  let skipped = 0;
  for (let i = 0; i < rec.done; i++) {
    if (rec.status[i] === SampleStatus.Lifted) lifted.push(i);
    else if (rec.status[i] === SampleStatus.NotLifted) notLifted++;
    else skipped++;
  }
  const n = lifted.length;
  const margins = lifted.map((i) => rec.margin[i]);
  const bruised = margins.filter((m) => m < 1).length;
  const sorted = [...margins].sort((a, b) => a - b);
  const ran = n + notLifted;
  const drivers = rec.varied
    .map((input) => ({
      input,
      spearman: spearman(
        lifted.map((i) => rec.values[input][i]),
        margins,
      ),
    }))
    .filter((d): d is Driver => d.spearman !== null)
    .sort((a, b) => Math.abs(b.spearman) - Math.abs(a.spearman));
  return {
    lifted: n,
    notLifted,
    skipped,
    bruised,
    probability: n > 0 ? bruised / n : null,
    confidence: n > 0 ? wilsonInterval(bruised, n) : null,
    notLiftedProbability: ran > 0 ? notLifted / ran : null,
    notLiftedConfidence: ran > 0 ? wilsonInterval(notLifted, ran) : null,
    margin:
      n > 0
        ? {
            p05: quantileSorted(sorted, 0.05),
            median: quantileSorted(sorted, 0.5),
            p95: quantileSorted(sorted, 0.95),
          }
        : null,
    drivers,
  };
}
