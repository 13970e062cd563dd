import { FemConvergenceError, FemInputError } from '../errors';
import { validateSqueezeInput, type SqueezeInput } from '../squeeze/01-input';
import { gripMargin, type GripHint } from './grip-margin';
import {
  bandCentre,
  designSamples,
  POISSON_BAND,
  sampleInput,
  type SampleDesign,
} from './mc-samples';
import { SampleStatus, summarise, type SampleRecord, type SampleSummary } from './mc-summary';
import { randomStream, type RandomStream } from './prng';
import { SPREAD_INPUTS, type SpreadInput, type Spreads } from './spread';

/** Most samples one run may take. */
export const MAX_SAMPLES = 100_000;

/** A Monte Carlo of the bruise margin at the grip point over spread inputs. */
export interface MonteCarloInput {
  /** the nominal case; needs density, friction and bruiseThreshold */
  base: SqueezeInput;
  /** spreads of modulus, poisson, size, density, friction, bruiseThreshold (see Spread) */
  spreads: Spreads;
  /** number of samples, 1..MAX_SAMPLES */
  samples: number;
  /** seed of the random stream, a safe integer ≥ 0 (default 1); same seed, same answer */
  seed?: number;
  /** width of a Poisson's-ratio band, (0, 0.1] (default 0.02): one unit body per band */
  poissonBand?: number;
}

/** Progress and cancellation of a run. */
export interface MonteCarloOptions {
  /** called with the fraction of samples done, in (0, 1], after each chunk */
  onProgress?: (fraction: number) => void;
  /** checked before each chunk; when aborted, the run stops and returns what it has */
  signal?: { readonly aborted: boolean };
  /** samples per chunk (default: 1 % of the samples, at least 1) */
  chunk?: number;
}

/**
 * Result of a run, over the samples completed. `probability` is P(margin < 1) among the samples
 * the grip lifts within the travel, with its Wilson 95 % band; samples not lifted have no grip
 * point, and are counted apart (`notLifted…`). Skipped samples are those the model refused.
 */
export interface MonteCarloResult extends SampleSummary {
  samples: number;
  completed: number;
  cancelled: boolean;
  seed: number;
  /** bruise margin of the nominal case at its grip point (null if it is not lifted) */
  nominalMargin: number | null;
  /** distinct reasons of skipped samples */
  skipReasons: string[];
  /** Poisson's ratios the samples ran at, one per band (the nominal ν when it does not vary) */
  poissonBands: number[];
}

/** A run in progress: `step` runs up to `count` more samples; `result` summarises so far. */
export interface MonteCarloRun {
  readonly samples: number;
  done(): number;
  step(count: number): void;
  result(cancelled: boolean): MonteCarloResult;
}

/**
 * Prepares a run: validates the base case and the spreads, computes the nominal margin. Every
 * sample draws one standard normal per input of SPREAD_INPUTS, in that order, so adding a spread
 * to one input leaves the others' draws alone. Samples are run in draw order, so a cancelled run
 * holds an unbiased prefix.
 * @throws FemInputError naming the field (base inputs, `spreads.…`, samples, seed, poissonBand)
 */
export function createMonteCarlo(input: MonteCarloInput): MonteCarloRun {
  const nominal = validateSqueezeInput(input.base);
  const design = designSamples(
    input.base,
    nominal,
    input.spreads,
    input.poissonBand ?? POISSON_BAND,
  );
  const { samples } = input;
  if (!Number.isInteger(samples) || samples < 1 || samples > MAX_SAMPLES) {
    throw new FemInputError('samples', `samples must be a whole number from 1 to ${MAX_SAMPLES}`);
  }
  const seed = input.seed ?? 1;
  const stream = randomStream(seed);
  const varied = SPREAD_INPUTS.filter((k) => design.samplers[k].varies);
  const rec: SampleRecord = {
    done: 0,
    status: new Uint8Array(samples),
    margin: new Float64Array(samples),
    values: Object.fromEntries(SPREAD_INPUTS.map((k) => [k, new Float64Array(samples)])) as Record<
      SpreadInput,
      Float64Array
    >,
    varied,
  };
  const nominalMargin = gripMargin(input.base).margin;
  const reasons = new Set<string>();
  const bands = new Set<number>();
  const hint: GripHint = {};
  const step = (count: number) => {
    const end = Math.min(samples, rec.done + count);
    for (; rec.done < end; rec.done++) runSample(rec, design, stream, hint, reasons, bands);
  };
  return {
    samples,
    done: () => rec.done,
    step,
    result: (cancelled) => ({
      samples,
      completed: rec.done,
      cancelled,
      seed,
      nominalMargin,
      ...summarise(rec),
      skipReasons: [...reasons],
      poissonBands: [...bands].sort((a, b) => a - b),
    }),
  };
}

function runSample(
  rec: SampleRecord,
  design: SampleDesign,
  stream: RandomStream,
  hint: GripHint,
  reasons: Set<string>,
  bands: Set<number>,
): void {
  const i = rec.done;
  const x = {} as Record<SpreadInput, number>;
  for (const k of SPREAD_INPUTS) {
    x[k] = design.samplers[k].value(stream.normal());
    rec.values[k][i] = x[k];
  }
  const input = sampleInput(design, x);
  bands.add(design.samplers.poisson.varies ? bandCentre(x.poisson, design.band) : x.poisson);
  try {
    const g = gripMargin(input, hint);
    hint.active = g.active;
    if (g.increment !== null) hint.increment = g.increment;
    rec.status[i] = g.margin === null ? SampleStatus.NotLifted : SampleStatus.Lifted;
    rec.margin[i] = g.margin ?? 0;
  } catch (error) {
    if (!(error instanceof FemInputError || error instanceof FemConvergenceError)) throw error;
    rec.status[i] = SampleStatus.Skipped;
    reasons.add(error.message);
  }
}
