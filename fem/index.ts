/**
 * Tenderline numerical core — the only import point for the rest of the app. Pure TypeScript,
 * SI units throughout (m, N, Pa, kg); pressures and forces of contact are compressive-positive
 * magnitudes. Every function documents its units and sign conventions where it is declared.
 */
export { STANDARD_GRAVITY } from './constants';
export { MODEL_VERSION } from './version';
export { FemConvergenceError, FemInputError } from './errors';
export {
  BODY_MODELS,
  MESH_LEVELS,
  RENAMED_MESH_LEVELS,
  type BodyModel,
  type CondensedBody,
  type EdgeBand,
  type MeshLevel,
  type StressSample,
  type UnitBodyKey,
} from './types';
export {
  requireFinite,
  requireNonNegative,
  requireOneOf,
  requirePoisson,
  requirePositive,
} from './validate';
export {
  ASPECT_MAX,
  ASPECT_MIN,
  CACHE_BYTES,
  CACHE_LIMIT,
  clearCondensedBodyCache,
  getCondensedBody,
  type FemBody,
} from './body/cache';
export {
  contactBandOf,
  contactScaleOf,
  poissonBandOf,
  CONTACT_SCALE_MAX,
  CONTACT_SCALE_MIN,
} from './body/grading';
export * from './closed-form';
export { solveContact, type ContactOptions, type ContactSolution } from './solver/active-set';
export { createContactSystem, type ContactSystem } from './solver/compliance';
export { monotoneRoot, type RootBracket, type RootTolerance } from './solver/monotone-root';

// The squeeze pipeline, fem/squeeze/, one stage per numbered file; each stage prepares and calls
// only the stage before it: 01 input → 02 body → 03 contact → 04 pressure → 05 shear →
// 06 liftability → 07 run (runSqueeze) → 08 sweep (sweepPadDiameters).
export {
  validateSqueezeInput,
  DEFAULT_FACING_POISSON,
  MAX_TRAVEL_FRACTION,
  type FacingInput,
  type LiftInput,
  type SqueezeCase,
  type SqueezeInput,
} from './squeeze/01-input';
export { prepareBody, type BodyStage } from './squeeze/02-body';
export {
  padForce,
  prepareContact,
  solveAt,
  type ContactStage,
  type FacingStage,
  type StageSolution,
} from './squeeze/03-contact';
export {
  contactRadius,
  preparePressure,
  pressureAt,
  type PressureAt,
  type PressureStage,
} from './squeeze/04-pressure';
export {
  prepareShear,
  stateAt,
  type ShearStage,
  type SqueezeState,
  type StateAt,
} from './squeeze/05-shear';
export {
  findLiftability,
  liftStateAt,
  prepareLift,
  profileOf,
  runIncrements,
  GRIP_RATIO_TOLERANCE,
  GRIP_TOLERANCE,
  type GripPoint,
  type IncrementTrack,
  type Liftability,
  type LiftStage,
  type PressurePoint,
} from './squeeze/06-liftability';
export {
  meshSummary,
  regradeRadius,
  runCase,
  runSqueeze,
  squeezeResultOf,
  squeezeWarnings,
  type CaseRun,
  type MeshSummary,
  type SqueezeResult,
} from './squeeze/07-run';
export { sweepPadDiameters, type PadSweepPoint } from './squeeze/08-sweep';
export { fruitMass, liftRatio, margin, requiredHoldLoad, type GripRule } from './squeeze/grip';
export { hertzComparison, type HertzComparison, type HertzFigures } from './squeeze/hertz';
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
  contactPoints,
  nodesToPoints,
  pointsToNodes,
  type ContactPoints,
} from './squeeze/contact-points';
export { recoverPressure, surfaceWeights, type SurfaceWeights } from './squeeze/pressure-recovery';
export {
  squeezeResultJson,
  type ResultJsonOptions,
  type SqueezeResultJson,
} from './squeeze/result-json';
export { resultUnits } from './squeeze/result-units';
export {
  getShearField,
  maxShearUnder,
  type ShearField,
  type ShearPeak,
  type ShearUnder,
} from './squeeze/shear-field';
export { stateWarnings } from './squeeze/state-warnings';
export {
  inputWarnings,
  CHECKED_POISSON,
  FACING_STRAIN_LIMIT,
  MIN_CONTACT_NODES,
  SMALL_TRAVEL_FRACTION,
  type SqueezeWarning,
  type SqueezeWarningCode,
} from './squeeze/warnings';

// Slip map at the grip (fem/squeeze/slip-*.ts) and the probability of bruising
// (fem/probability/): both run the squeeze only through the stages' exports above, imported
// from the stage files themselves (no file inside fem/ imports this one).
export {
  ciavarellaJager,
  type ContactHistory,
  type NormalContactState,
  type SlipMap,
  type SlipNode,
} from './squeeze/slip-superposition';
export { slipMapAtGrip, slipMapAtTravel, slipMapOfRun, type GripSlipMap } from './squeeze/slip-map';
export { randomStream, splitMix64, xoshiro128ss, type RandomStream } from './probability/prng';
export {
  samplerOf,
  SPREAD_INPUTS,
  type Sampler,
  type Spread,
  type SpreadInput,
  type Spreads,
} from './probability/spread';
export {
  quantileSorted,
  ranks,
  spearman,
  wilsonInterval,
  Z_95,
  type Interval,
} from './probability/statistics';
export { gripMargin, type GripHint, type GripSample } from './probability/grip-margin';
export { bandCentre, POISSON_BAND } from './probability/mc-samples';
export { type Driver, type SampleSummary } from './probability/mc-summary';
export {
  createMonteCarlo,
  MAX_SAMPLES,
  type MonteCarloInput,
  type MonteCarloOptions,
  type MonteCarloResult,
  type MonteCarloRun,
} from './probability/monte-carlo';
export { runMonteCarlo, runMonteCarloAsync } from './probability/run-monte-carlo';
