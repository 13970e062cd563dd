import { FemInputError } from '../errors';

/**
 * Spread of one uncertain input: a standard deviation `sd` about the nominal value of the base
 * input, or a range `low`–`high` read as the central ±2σ (95.4 %) of the distribution, the usual
 * meaning of a quoted spread of measured properties. Same units as the input (size: m of the
 * equatorial radius). Zero spread (sd 0, or low = high) fixes the input.
 */
export type Spread = { sd: number } | { low: number; high: number };

/** Inputs that may carry a spread, in the fixed order of the random draws per sample. */
export const SPREAD_INPUTS = [
  'modulus',
  'poisson',
  'size',
  'density',
  'friction',
  'bruiseThreshold',
] as const;

/** One input that may carry a spread; `size` is the equatorial radius (the shape is kept). */
export type SpreadInput = (typeof SPREAD_INPUTS)[number];

/** Spreads per input; an input left out keeps its nominal value. */
export type Spreads = Partial<Record<SpreadInput, Spread>>;

/** A validated spread: the value for a standard normal draw z, and whether it varies at all. */
export interface Sampler {
  varies: boolean;
  value(z: number): number;
}

const logit = (t: number) => Math.log(t / (1 - t));
const logistic = (y: number) => 1 / (1 + Math.exp(-y));

/**
 * The sampler of one input. Positive quantities are log-normal, so they stay positive: with `sd`
 * the mean is the nominal m and the standard deviation sd, σ² = ln(1 + (sd/m)²) and
 * x = m·exp(σz − σ²/2) (the log-normal moments, e.g. N. L. Johnson, S. Kotz, N. Balakrishnan,
 * Continuous Univariate Distributions, vol. 1, 2nd ed., 1994, ch. 14 [from memory]); a range puts
 * ln low and ln high at ∓2σ. Poisson's ratio is logit-normal on 2ν, so it stays inside (0, 0.5):
 * a range puts logit(2·low), logit(2·high) at ∓2σ; `sd` gives median ν₀ and, to first order,
 * standard deviation sd (dν/dy = t(1 − t)/2 at t = 2ν₀).
 * @throws FemInputError naming `spreads.<input>.sd|low|high`
 */
export function samplerOf(input: SpreadInput, nominal: number, spread?: Spread): Sampler {
  const fixed = (v: number): Sampler => ({ varies: false, value: () => v });
  if (spread === undefined) return fixed(nominal);
  const field = `spreads.${input}`;
  const isPoisson = input === 'poisson';
  const form = formOf(field, spread);
  if (form === 'sd') {
    const sd = checkNumber(`${field}.sd`, (spread as { sd: number }).sd);
    if (sd === 0) return fixed(nominal);
    if (isPoisson) {
      if (!(nominal > 0)) {
        throw new FemInputError(`${field}.sd`, `${field}.sd needs a poisson above 0; give a range`);
      }
      const t = 2 * nominal;
      const y0 = logit(t);
      const s = sd / (t * (1 - t) * 0.5);
      return { varies: true, value: (z) => logistic(y0 + s * z) / 2 };
    }
    const s2 = Math.log1p((sd / nominal) ** 2);
    const s = Math.sqrt(s2);
    return { varies: true, value: (z) => nominal * Math.exp(s * z - s2 / 2) };
  }
  const { low: lo, high: hi } = spread as { low: number; high: number };
  const low = checkNumber(`${field}.low`, lo);
  const high = checkNumber(`${field}.high`, hi);
  if (low === 0) throw new FemInputError(`${field}.low`, `${field}.low must be greater than zero`);
  if (isPoisson && high >= 0.5) {
    throw new FemInputError(`${field}.high`, `${field}.high must be below 0.5`);
  }
  if (high < low) {
    throw new FemInputError(`${field}.high`, `${field}.high must not be below ${field}.low`);
  }
  if (high === low) return fixed(low);
  const [a, b] = isPoisson ? [logit(2 * low), logit(2 * high)] : [Math.log(low), Math.log(high)];
  const centre = (a + b) / 2;
  const s = (b - a) / 4;
  return isPoisson
    ? { varies: true, value: (z) => logistic(centre + s * z) / 2 }
    : { varies: true, value: (z) => Math.exp(centre + s * z) };
}

function formOf(field: string, spread: unknown): 'sd' | 'range' {
  const keys = spread && typeof spread === 'object' ? Object.keys(spread).sort().join(',') : '';
  if (keys === 'sd') return 'sd';
  if (keys === 'high,low') return 'range';
  throw new FemInputError(field, `${field} must give either sd or low and high`);
}

function checkNumber(field: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) {
    throw new FemInputError(field, `${field} must be a finite number`);
  }
  if (v < 0) throw new FemInputError(field, `${field} must not be negative`);
  return v;
}
