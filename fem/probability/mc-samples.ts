import { FemInputError } from '../errors';
import { MAX_TRAVEL_FRACTION, type SqueezeCase, type SqueezeInput } from '../squeeze/01-input';
import { randomStream } from './prng';
import { samplerOf, SPREAD_INPUTS, type Sampler, type SpreadInput, type Spreads } from './spread';

/** Default width of a Poisson's-ratio band: one cached unit body per band. */
export const POISSON_BAND = 0.02;

/** The samplers of every spread input, the nominal case and the Poisson band width. */
export interface SampleDesign {
  base: SqueezeInput;
  nominal: SqueezeCase;
  samplers: Record<SpreadInput, Sampler>;
  band: number;
}

/**
 * Builds the samplers of `spreads` about the nominal values of the validated case `nominal`,
 * which needs the grip inputs (density, friction) and a bruise threshold.
 * @throws FemInputError naming 'density', 'bruiseThreshold', 'poissonBand' or `spreads.…`
 */
export function designSamples(
  base: SqueezeInput,
  nominal: SqueezeCase,
  spreads: Spreads,
  band: number,
): SampleDesign {
  const lift = nominal.lift;
  if (!lift) throw new FemInputError('density', 'density and friction are needed for the grip');
  if (lift.bruiseThreshold === null) {
    throw new FemInputError('bruiseThreshold', 'bruiseThreshold is needed for the bruise margin');
  }
  if (!(typeof band === 'number' && band > 0 && band <= 0.1)) {
    throw new FemInputError('poissonBand', 'poissonBand must lie in (0, 0.1]');
  }
  const values: Record<SpreadInput, number> = {
    modulus: nominal.modulus,
    poisson: nominal.poisson,
    size: nominal.equatorialRadius,
    density: lift.density,
    friction: lift.friction,
    bruiseThreshold: lift.bruiseThreshold,
  };
  const samplers = Object.fromEntries(
    SPREAD_INPUTS.map((k) => [k, samplerOf(k, values[k], spreads?.[k])]),
  ) as Record<SpreadInput, Sampler>;
  return { base, nominal, samplers, band };
}

/**
 * Centre of the Poisson band holding ν: bands [jw, (j+1)w) of width w, the last one cut at 0.5.
 * A sample is run on its band's body with E scaled so that E* = E/(1 − ν²) is its own: the
 * Hertz pressure at a given force depends on E* alone (Johnson, Contact Mechanics, 1985, ch. 4),
 * so only the weaker dependence of the finite body on ν itself is banded (≈ 5e-4 in the margin
 * for w = 0.02 up to ν = 0.45 on the balanced mesh, against a run at the sample's own ν).
 */
export function bandCentre(nu: number, width: number): number {
  const j = Math.floor(nu / width);
  return Math.min((j + 0.5) * width, (j * width + 0.5) / 2);
}

/** The squeeze input of one sample, from the input values drawn for it. */
export function sampleInput(design: SampleDesign, x: Record<SpreadInput, number>): SqueezeInput {
  const { base, nominal, samplers } = design;
  let { modulus, poisson } = x;
  if (samplers.poisson.varies) {
    const nu = bandCentre(poisson, design.band);
    modulus *= (1 - nu * nu) / (1 - poisson * poisson);
    poisson = nu;
  }
  const input: SqueezeInput = {
    ...base,
    modulus,
    poisson,
    density: x.density,
    friction: x.friction,
    bruiseThreshold: x.bruiseThreshold,
  };
  if (!samplers.size.varies) return input;
  const [R, axial] =
    base.axialRadius === undefined ? [x.size, undefined] : exactRadii(x.size, nominal.aspect);
  // A small fruit takes at most the model's largest travel (15 % of its axial radius).
  const reach = MAX_TRAVEL_FRACTION * (axial ?? R);
  return {
    ...input,
    equatorialRadius: R,
    axialRadius: axial,
    travel: Math.min(base.travel, reach),
  };
}

/**
 * Radii near (R, R·aspect) whose ratio is exactly `aspect` in floating point, so the sample finds
 * the cached body of that aspect: R·aspect/R misses it by a unit in the last place for about one
 * sample in ten. Tries R moved by pseudo-random amounts below 1e-12 of itself (physically nil);
 * for aspects within ~1e-4 below 0.5, 1 or 2 it can fail (about 5 % of samples), and the sample
 * then runs on a body of its own: correct, but built for it.
 */
function exactRadii(R0: number, aspect: number): [number, number] {
  const jitter = randomStream(0);
  let R = R0;
  for (let j = 0; j < 32; j++) {
    const axial = R * aspect;
    if (axial / R === aspect) return [R, axial];
    const e = axial / aspect;
    if (axial / e === aspect) return [e, axial];
    R = R0 * (1 + (jitter.uniform() - 0.5) * 2e-12);
  }
  return [R0, R0 * aspect];
}
