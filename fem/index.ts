/**
 * Tenderline numerical core — the only import point for the rest of the app. Pure TypeScript,
 * SI units throughout (m, N, Pa, kg); pressures and forces of contact are compressive-positive
 * magnitudes. Every function documents its units and sign conventions where it is declared.
 */
export { FemConvergenceError, FemInputError } from './errors';
export type { BodyModel, CondensedBody, MeshLevel, StressSample, UnitBodyKey } from './types';
export { requireFinite, requireNonNegative, requirePoisson, requirePositive } from './validate';
export * from './body/cache';
export * from './closed-form';
export {
  createPad,
  padLift,
  padReach,
  DEFAULT_EDGE_RADIUS,
  SHARP_EDGE_RADIUS,
  type PadGeometry,
  type PadSpec,
} from './squeeze/pad';
export {
  createContactSystem,
  solveContact,
  type ContactOptions,
  type ContactSolution,
  type ContactSystem,
} from './solver/active-set';
export { contactRadius, recoverPressure, surfaceWeights } from './squeeze/pressure-recovery';
export {
  bisectGrip,
  fruitMass,
  liftRatio,
  margin,
  requiredHoldLoad,
  STANDARD_GRAVITY,
  type GripRule,
} from './squeeze/grip';
export {
  validateSqueezeInput,
  MAX_TRAVEL_FRACTION,
  type LiftInput,
  type SqueezeCase,
  type SqueezeInput,
} from './squeeze/01-input';
export {
  describeState,
  padForce,
  prepareSqueeze,
  solveAt,
  type PreparedSqueeze,
  type SqueezeState,
} from './squeeze/03-contact';
export { getShearField, maxShearUnder, type ShearField, type ShearPeak } from './squeeze/shear-field';
export { hertzComparison, type HertzComparison, type HertzFigures } from './squeeze/hertz';
export {
  findLiftability,
  runIncrements,
  runSqueeze,
  squeezeWarnings,
  GRIP_TOLERANCE,
  type GripPoint,
  type IncrementTrack,
  type Liftability,
  type PressurePoint,
  type SqueezeResult,
} from './squeeze/07-run';
export { sweepPadDiameters, type PadSweepPoint } from './squeeze/08-sweep';
