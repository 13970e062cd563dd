import { apparentModulusFromCompression, FemInputError } from '@/fem';
import { ValidationError } from '@/lib/errors';
import { fileError } from './decode';
import { FIT_STRAIN, MIN_FIT_POINTS } from './limits';
import type { CurvePoint } from './parse-curve';

/** The sample's shape at the plates: a sphere's diameter, or two principal radii of curvature. */
export type SampleGeometry =
  { kind: 'sphere'; diameterMm: number } | { kind: 'radii'; radiiMm: readonly [number, number] };

export interface CompressionFit {
  /** apparent Young's modulus, MPa */
  modulusMpa: number;
  rSquared: number;
  /** the first and last displacement fitted, mm */
  fromMm: number;
  toMm: number;
  /** the rule's upper limit of displacement, mm (FIT_STRAIN of the size) */
  limitMm: number;
  pointsUsed: number;
  /** F = slope · D^(3/2), N/mm^(3/2): the fitted Hertz curve */
  slope: number;
}

/** The size strain is taken against: the diameter, or twice the geometric-mean radius. */
export function sampleSizeMm(geometry: SampleGeometry): number {
  if (geometry.kind === 'sphere') return geometry.diameterMm;
  return 2 * Math.sqrt(geometry.radiiMm[0] * geometry.radiiMm[1]);
}

export function fitLimitMm(geometry: SampleGeometry): number {
  return FIT_STRAIN * sampleSizeMm(geometry);
}

const fmt = (x: number) => String(Number(x.toPrecision(3)));

// The numerical core names its own inputs; the form's fields are named differently.
function refusal(error: FemInputError, geometry: SampleGeometry): ValidationError {
  if (error.field === 'poisson') {
    return new ValidationError(error.message, { poisson: [error.message] });
  }
  if (error.field === 'diameter' || error.field === 'principalRadii') {
    const field = geometry.kind === 'sphere' ? 'diameterMm' : 'radius1Mm';
    return new ValidationError(error.message, { [field]: [error.message] });
  }
  if (error.field === 'force') {
    return fileError(
      `the force does not rise with displacement over the fitted range (${error.message})`,
    );
  }
  return fileError(`the curve cannot be fitted: ${error.message}`);
}

/**
 * Fit the apparent modulus over the small-deformation range: points with 0 < D ≤ 5 % of the
 * sample size (ASAE/ASABE S368, Compression Test of Food Materials of Convex Shape: Hertz
 * theory for a convex body between parallel plates; F against D^(3/2) by least squares).
 */
export function fitCompressionCurve(
  points: readonly CurvePoint[],
  geometry: SampleGeometry,
  poisson: number,
): CompressionFit {
  const limitMm = fitLimitMm(geometry);
  const used = points.filter((p) => p.displacementMm > 0 && p.displacementMm <= limitMm);
  if (used.length < MIN_FIT_POINTS) {
    const size = geometry.kind === 'sphere' ? 'diameter' : 'size 2√(R₁R₂)';
    throw fileError(
      `only ${used.length} readings lie in the fitted range (0 < displacement ≤ ${fmt(limitMm)} mm, 5 % of the ${fmt(sampleSizeMm(geometry))} mm ${size}); at least ${MIN_FIT_POINTS} are needed`,
    );
  }
  try {
    const fit = apparentModulusFromCompression({
      travel: points.map((p) => p.displacementMm / 1000),
      force: points.map((p) => p.forceN),
      poisson,
      ...(geometry.kind === 'sphere'
        ? { diameter: geometry.diameterMm / 1000 }
        : { principalRadii: [geometry.radiiMm[0] / 1000, geometry.radiiMm[1] / 1000] as const }),
      maxTravel: limitMm / 1000,
    });
    return {
      modulusMpa: fit.modulus / 1e6,
      rSquared: fit.rSquared,
      fromMm: used[0].displacementMm,
      toMm: used[used.length - 1].displacementMm,
      limitMm,
      pointsUsed: fit.pointsUsed,
      slope: fit.slope / 1000 ** 1.5,
    };
  } catch (error) {
    if (error instanceof FemInputError) throw refusal(error, geometry);
    throw error;
  }
}
