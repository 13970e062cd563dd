import { FemInputError } from '../errors';
import { requirePoisson, requirePositive } from '../validate';
import { hertzEllipticalAtApproach } from './hertz-elliptical';
import { requireFiniteResult } from './finite-result';

/** A force–deformation curve of a convex body squeezed between two rigid parallel plates. */
export interface ApparentModulusInput {
  /** total plate travel D (sum of both contacts' approach), m; ≥ 0 and strictly increasing */
  travel: readonly number[];
  /** plate force F at each travel, N (≥ 0); same length as `travel` */
  force: readonly number[];
  /** Poisson's ratio assumed for the flesh, in [0, 0.5) */
  poisson: number;
  /** diameter d of a spherical body, m (> 0); give this or `principalRadii` */
  diameter?: number;
  /**
   * the body's two principal radii of curvature R, R′ at each plate contact, m (> 0, any order;
   * the same at both plates); solved with exact Hertz elliptical theory instead of `diameter`
   */
  principalRadii?: readonly [number, number];
  /** fit only points with D ≤ maxTravel, m (> 0); default: all points */
  maxTravel?: number;
}

/** Result of the apparent-modulus fit, SI. */
export interface ApparentModulusFit {
  /** apparent Young's modulus E, Pa */
  modulus: number;
  /** coefficient of determination 1 − SS_res/SS_tot (about the mean force) of the fit; ≤ 1 */
  rSquared: number;
  /** number of points with 0 < D ≤ maxTravel that entered the fit */
  pointsUsed: number;
  /** least-squares slope of F against D^(3/2) through the origin, N/m^(3/2) */
  slope: number;
}

function checkCurve(travel: readonly number[], force: readonly number[]): void {
  if (!Array.isArray(travel)) throw new FemInputError('travel', 'travel must be an array');
  if (!Array.isArray(force) || force.length !== travel.length) {
    throw new FemInputError('force', 'force must have one entry per travel entry');
  }
  travel.forEach((d, i) => {
    if (!Number.isFinite(d) || d < 0) {
      throw new FemInputError('travel', `travel[${i}] must be a finite number ≥ 0`);
    }
    if (i > 0 && d <= travel[i - 1]) {
      throw new FemInputError('travel', `travel must increase strictly (travel[${i}])`);
    }
  });
  force.forEach((f, i) => {
    if (!Number.isFinite(f) || f < 0) {
      throw new FemInputError('force', `force[${i}] must be a finite number ≥ 0`);
    }
  });
}

// Plate force per unit E* at unit approach of one contact: F = coefficient·E*·δ^(3/2), m^½.
function hertzCoefficient(input: ApparentModulusInput): number {
  if (input.diameter !== undefined && input.principalRadii !== undefined) {
    throw new FemInputError('principalRadii', 'give either diameter or principalRadii, not both');
  }
  if (input.principalRadii !== undefined) {
    const unit = { radii: input.principalRadii, effectiveModulus: 1, approach: 1 };
    return hertzEllipticalAtApproach(unit).force;
  }
  if (input.diameter === undefined) {
    throw new FemInputError('diameter', 'diameter is required (or principalRadii)');
  }
  return (4 / 3) * Math.sqrt(requirePositive('diameter', input.diameter) / 2);
}

/**
 * Apparent modulus from a parallel-plate compression test (ASABE S368 basis: Hertz, small
 * deformation; compare samples only at like deformation and loading rate). Each plate contact
 * takes half the travel, δ = D/2, and F = (4/3)E*R^½δ^(3/2) with E* = E/(1 − ν²), R = d/2
 * (Johnson 1985, ch. 4), so for a sphere E = 3F(1 − ν²)/(d^½ D^(3/2)) [computed]. F is fitted
 * against D^(3/2) by least squares through the origin.
 * @throws FemInputError naming 'travel', 'force', 'poisson', 'diameter', 'principalRadii' or 'maxTravel'
 */
export function apparentModulusFromCompression(input: ApparentModulusInput): ApparentModulusFit {
  checkCurve(input.travel, input.force);
  const poisson = requirePoisson('poisson', input.poisson);
  const maxTravel =
    input.maxTravel === undefined ? Infinity : requirePositive('maxTravel', input.maxTravel);
  const coefficient = hertzCoefficient(input);
  const used = input.travel
    .map((d, i) => ({ x: d ** 1.5, f: input.force[i], d }))
    .filter((p) => p.d > 0 && p.d <= maxTravel);
  if (used.length < 3) {
    const field = input.maxTravel === undefined ? 'travel' : 'maxTravel';
    throw new FemInputError(field, `${field} leaves ${used.length} points with D > 0; need 3`);
  }
  const sxx = used.reduce((sum, p) => sum + p.x * p.x, 0);
  const slope = used.reduce((sum, p) => sum + p.x * p.f, 0) / sxx;
  if (!(slope > 0)) throw new FemInputError('force', 'force must rise with travel');
  const mean = used.reduce((sum, p) => sum + p.f, 0) / used.length;
  const ssTot = used.reduce((sum, p) => sum + (p.f - mean) ** 2, 0);
  if (!(ssTot > 0)) throw new FemInputError('force', 'force does not vary over the fitted points');
  const ssRes = used.reduce((sum, p) => sum + (p.f - slope * p.x) ** 2, 0);
  const modulus = (slope * (1 - poisson * poisson) * 2 ** 1.5) / coefficient;
  return {
    modulus: requireFiniteResult('force', 'the modulus', modulus),
    rSquared: 1 - ssRes / ssTot,
    pointsUsed: used.length,
    slope: requireFiniteResult('force', 'the slope', slope),
  };
}
