import { ASPECT_MAX, ASPECT_MIN } from '../body/cache';
import { FemInputError } from '../errors';
import {
  BODY_MODELS,
  MESH_LEVELS,
  RENAMED_MESH_LEVELS,
  type BodyModel,
  type MeshLevel,
} from '../types';
import {
  requireFinite,
  requireNonNegative,
  requireOneOf,
  requirePoisson,
  requirePositive,
} from '../validate';
import { createPad, type PadGeometry } from './pad';

/**
 * Inputs of a squeeze check, SI units (m, Pa, kg/m³). Two identical pads squeeze the fruit along
 * its axis; each pad moves `travel` toward the centre, so the pads close by 2·travel.
 */
export interface SqueezeInput {
  /** 'axisymmetric' (default, body of revolution) or 'plane-strain' (slice, results per metre) */
  model?: BodyModel;
  /** equatorial radius R_eq, m (across the squeeze axis) */
  equatorialRadius: number;
  /** axial radius R_ax, m (along the squeeze axis); default R_eq (sphere) */
  axialRadius?: number;
  /** Young's modulus of the flesh, Pa */
  modulus: number;
  /** Poisson's ratio, in [0, 0.5) */
  poisson: number;
  /** travel of each pad toward the centre, m (> 0, ≤ 15 % of R_ax) */
  travel: number;
  /** load increments from zero to `travel`, integer 1..200 (default 20) */
  steps?: number;
  /** mesh level (default 'balanced') */
  mesh?: MeshLevel;
  /**
   * contact radius (m) the mesh is graded to; default the Hertz estimate √(R_p·travel) at the
   * full travel (R_p = R_eq²/R_ax). A run whose contact holds too few nodes repeats itself with
   * this set to its contact radius.
   */
  meshContactRadius?: number;
  /** overall pad face diameter D, m; omit for an infinite flat plate */
  padDiameter?: number;
  /** radius of the pad's rounded edge r_e, m (0 < r_e < D/2; default 2 mm) */
  edgeRadius?: number;
  /**
   * Young's modulus E_l of a compliant facing on the pad, Pa: an elastic layer of its own,
   * bonded to the rigid pad; give with facingThickness, omit both for a rigid pad face
   */
  facingModulus?: number;
  /** thickness t_l of the facing layer, m */
  facingThickness?: number;
  /** Poisson's ratio of the facing, in [0, 0.5) (default 0.45, with a warning) */
  facingPoisson?: number;
  /** flesh density, kg/m³ (with friction: enables liftability) */
  density?: number;
  /** pad–fruit Coulomb friction coefficient μ (> 0) */
  friction?: number;
  /** safety factor on weight SF ≥ 1 (default 1) */
  safetyFactor?: number;
  /** upward acceleration of the lift, in units of g (≥ 0, default 0) */
  accelG?: number;
  /** static bruise-threshold contact pressure, Pa (gives the bruise margin) */
  bruiseThreshold?: number;
  /** failure shear stress of the flesh, Pa (gives the shear margin) */
  failureShear?: number;
}

/** Validated input with defaults filled in (SI); `aspect` = axialRadius / equatorialRadius. */
export interface SqueezeCase {
  model: BodyModel;
  equatorialRadius: number;
  axialRadius: number;
  aspect: number;
  modulus: number;
  poisson: number;
  travel: number;
  steps: number;
  mesh: MeshLevel;
  /** contact radius the mesh is graded to, m; null = the Hertz estimate at the full travel */
  meshContactRadius: number | null;
  pad: PadGeometry;
  /** the pad's elastic facing layer; null = rigid pad face (replaces the Winkler `facingStiffness`) */
  facing: FacingInput | null;
  lift: LiftInput | null;
}

/** A pad facing, validated: modulus (Pa), thickness (m), Poisson's ratio. */
export interface FacingInput {
  modulus: number;
  thickness: number;
  poisson: number;
  /** true when facingPoisson was not given and the default was used */
  poissonAssumed: boolean;
}

/** Poisson's ratio of a facing when none is given. */
export const DEFAULT_FACING_POISSON = 0.45;

/** Liftability inputs, validated (see SqueezeInput for units). */
export interface LiftInput {
  density: number;
  friction: number;
  safetyFactor: number;
  accelG: number;
  bruiseThreshold: number | null;
  failureShear: number | null;
}

/** Largest travel per pad as a fraction of the axial radius (see validateSqueezeInput). */
export const MAX_TRAVEL_FRACTION = 0.15;

/**
 * Checks every input and fills defaults; throws FemInputError naming the field. Travel is capped
 * at 15 % of the axial radius: there a sphere's Hertz contact radius √(Rd) is already ≈ 0.4 R and
 * the strains near the pad exceed 10 %, far outside the small-strain linear model (and the mesh's
 * graded contact zone), so larger squeezes would return confident-looking nonsense.
 */
export function validateSqueezeInput(input: SqueezeInput): SqueezeCase {
  const model = requireOneOf('model', input.model ?? 'axisymmetric', BODY_MODELS);
  const renamed = RENAMED_MESH_LEVELS[input.mesh as string];
  if (renamed)
    throw new FemInputError('mesh', `mesh level '${input.mesh}' is now called '${renamed}'`);
  const mesh = requireOneOf('mesh', input.mesh ?? 'balanced', MESH_LEVELS);
  const equatorialRadius = requirePositive('equatorialRadius', input.equatorialRadius);
  const axialRadius =
    input.axialRadius === undefined
      ? equatorialRadius
      : requirePositive('axialRadius', input.axialRadius);
  const aspect = axialRadius / equatorialRadius;
  if (aspect < ASPECT_MIN || aspect > ASPECT_MAX) {
    throw new FemInputError(
      'axialRadius',
      `axialRadius must lie between ${ASPECT_MIN} and ${ASPECT_MAX} times the equatorialRadius`,
    );
  }
  const modulus = requirePositive('modulus', input.modulus);
  const poisson = requirePoisson('poisson', input.poisson);
  const travel = requirePositive('travel', input.travel);
  if (travel > MAX_TRAVEL_FRACTION * axialRadius) {
    throw new FemInputError(
      'travel',
      'travel must not exceed 15 % of the axial radius (small-strain model)',
    );
  }
  const steps = input.steps ?? 20;
  if (!Number.isInteger(steps) || steps < 1 || steps > 200) {
    throw new FemInputError('steps', 'steps must be an integer from 1 to 200');
  }
  const pad = createPad({ diameter: input.padDiameter, edgeRadius: input.edgeRadius });
  const meshContactRadius =
    input.meshContactRadius === undefined
      ? null
      : requirePositive('meshContactRadius', input.meshContactRadius);
  return {
    model,
    equatorialRadius,
    axialRadius,
    aspect,
    modulus,
    poisson,
    travel,
    steps,
    mesh,
    meshContactRadius,
    pad,
    facing: facing(input),
    lift: liftInput(input),
  };
}

function facing(input: SqueezeInput): FacingInput | null {
  const { facingModulus: em, facingThickness: t, facingPoisson: nu } = input;
  if (em === undefined && t === undefined) {
    if (nu !== undefined)
      throw new FemInputError('facingPoisson', 'facingPoisson needs facingModulus');
    return null;
  }
  if (em === undefined)
    throw new FemInputError('facingModulus', 'facingModulus is needed with facingThickness');
  if (t === undefined)
    throw new FemInputError('facingThickness', 'facingThickness is needed with facingModulus');
  return {
    modulus: requirePositive('facingModulus', em),
    thickness: requirePositive('facingThickness', t),
    poisson: nu === undefined ? DEFAULT_FACING_POISSON : requirePoisson('facingPoisson', nu),
    poissonAssumed: nu === undefined,
  };
}

function liftInput(input: SqueezeInput): LiftInput | null {
  const optional = (field: string, v: number | undefined) =>
    v === undefined ? null : requirePositive(field, v);
  const bruiseThreshold = optional('bruiseThreshold', input.bruiseThreshold);
  const failureShear = optional('failureShear', input.failureShear);
  const safetyFactor = requireFinite('safetyFactor', input.safetyFactor ?? 1);
  if (safetyFactor < 1) throw new FemInputError('safetyFactor', 'safetyFactor must be at least 1');
  const accelG = requireNonNegative('accelG', input.accelG ?? 0);
  const { density, friction } = input;
  if (density === undefined && friction === undefined) return null;
  if (density === undefined) throw new FemInputError('density', 'density is needed with friction');
  if (friction === undefined)
    throw new FemInputError('friction', 'friction is needed with density');
  return {
    density: requirePositive('density', density),
    friction: requirePositive('friction', friction),
    safetyFactor,
    accelG,
    bruiseThreshold,
    failureShear,
  };
}
