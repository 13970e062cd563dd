import { FemInputError } from '../errors';
import {
  createMonteCarlo,
  type MonteCarloInput,
  type MonteCarloOptions,
  type MonteCarloResult,
  type MonteCarloRun,
} from './monte-carlo';

function chunkOf(run: MonteCarloRun, options: MonteCarloOptions): number {
  const chunk = options.chunk ?? Math.max(1, Math.ceil(run.samples / 100));
  if (!Number.isInteger(chunk) || chunk < 1) {
    throw new FemInputError('chunk', 'chunk must be a whole number of at least 1');
  }
  return chunk;
}

/**
 * Seeded Monte Carlo of the bruise margin at the grip point: draws `samples` input sets from the
 * spreads, runs each on the cached unit body of its Poisson band (scaled in E and R, never a
 * body per sample) and returns P(margin < 1) with its Wilson 95 % band and the inputs that drive
 * it. Runs synchronously; see runMonteCarloAsync to keep a page responsive.
 * @throws FemInputError naming the field
 */
export function runMonteCarlo(
  input: MonteCarloInput,
  options: MonteCarloOptions = {},
): MonteCarloResult {
  const run = createMonteCarlo(input);
  const chunk = chunkOf(run, options);
  while (run.done() < run.samples) {
    if (options.signal?.aborted) return run.result(true);
    run.step(chunk);
    options.onProgress?.(run.done() / run.samples);
  }
  return run.result(false);
}

/** As runMonteCarlo, yielding to the event loop between chunks so progress and cancel can show. */
export async function runMonteCarloAsync(
  input: MonteCarloInput,
  options: MonteCarloOptions = {},
): Promise<MonteCarloResult> {
  const run = createMonteCarlo(input);
  const chunk = chunkOf(run, options);
  while (run.done() < run.samples) {
    if (options.signal?.aborted) return run.result(true);
    run.step(chunk);
    options.onProgress?.(run.done() / run.samples);
    await new Promise<void>((resolve) => setTimeout(resolve, 0));
  }
  return run.result(false);
}
