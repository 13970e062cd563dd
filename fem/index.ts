/**
 * Tenderline numerical core — the only import point for the rest of the app. Pure TypeScript,
 * SI units throughout (m, N, Pa, kg); pressures and forces of contact are compressive-positive
 * magnitudes. Every function documents its units and sign conventions where it is declared.
 */
export { FemConvergenceError, FemInputError } from './errors';
export type { BodyModel, CondensedBody, MeshLevel, StressSample, UnitBodyKey } from './types';
export { requireFinite, requireNonNegative, requirePoisson, requirePositive } from './validate';
export * from './body';
export * from './closed-form';
export {
  createPad,
  padLift,
  padReach,
  DEFAULT_EDGE_RADIUS,
  SHARP_EDGE_RADIUS,
  type PadGeometry,
  type PadSpec,
} from './pad';
export {
  createContactSystem,
  solveContact,
  type ContactOptions,
  type ContactSolution,
  type ContactSystem,
} from './contact';
export { contactRadius, recoverPressure, surfaceWeights } from './pressure';
export {
  bisectGrip,
  fruitMass,
  liftRatio,
  margin,
  requiredHoldLoad,
  STANDARD_GRAVITY,
  type GripRule,
} from './liftability';
export {
  validateSqueezeInput,
  MAX_TRAVEL_FRACTION,
  type LiftInput,
  type SqueezeCase,
  type SqueezeInput,
} from './squeeze-input';
export {
  describeState,
  padForce,
  prepareSqueeze,
  solveAt,
  type PreparedSqueeze,
  type SqueezeState,
} from './squeeze-state';
export { getShearField, maxShearUnder, type ShearField, type ShearPeak } from './squeeze-shear';
export { hertzComparison, type HertzComparison, type HertzFigures } from './squeeze-hertz';
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
} from './squeeze';
export { sweepPadDiameters, type PadSweepPoint } from './squeeze-sweep';
