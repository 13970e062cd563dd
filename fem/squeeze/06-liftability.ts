/**
 * Stage 6 of the squeeze pipeline: the load increments of stage 5 with their lift ratios, and the
 * grip point (least travel that lifts the fruit) with its bruise and shear margins.
 */
import type { SqueezeInput } from './01-input';
import {
  prepareShear,
  stateAt,
  type ShearStage,
  type SqueezeState,
  type StateAt,
} from './05-shear';
import { monotoneRoot } from '../solver/monotone-root';
import { fruitMass, liftRatio, margin, requiredHoldLoad, type GripRule } from './grip';

/** The shear stage plus the grip rule; `rule` is null without liftability inputs. */
export interface LiftStage extends ShearStage {
  rule: GripRule | null;
}

/** Contact pressure at one contact node: radius r (m) from the axis, pressure (Pa, compressive +). */
export interface PressurePoint {
  r: number;
  pressure: number;
}

/** One increment as run: travel (m), final active set, state summary and nodal pressures (Pa). */
export interface IncrementTrack {
  travel: number;
  active: Uint8Array;
  state: SqueezeState;
  pressure: Float64Array;
}

/** The grip point: least travel whose lift ratio reaches 1, with its margins (> 1 is safe). */
export interface GripPoint extends SqueezeState {
  /** bruise threshold / peak contact pressure; null without a threshold */
  bruiseMargin: number | null;
  /** failure shear / largest shear under the contact; null without a failure shear */
  shearMargin: number | null;
  profile: PressurePoint[];
}

/** Liftability of the two-pad grip. `grip` is null (with `reason`) if the travel never lifts it. */
export interface Liftability {
  /** fruit mass, kg (kg per metre in plane strain) */
  mass: number;
  /** SF·m·(g + a), N (N/m) */
  holdLoad: number;
  /** pad normal force needed, holdLoad / (2μ), N (N/m) */
  requiredForce: number;
  grip: GripPoint | null;
  reason: string | null;
}

/** Tolerance on the grip travel, as a fraction of the requested travel. */
export const GRIP_TOLERANCE = 1e-5;

/**
 * Tolerance on the lift ratio at the grip: the search aims at a ratio of 1 + 1e-10 (so a re-solve
 * at the grip travel, whose force differs by round-off of order 1e-15, still lifts) and stops
 * once the ratio is within 1e-9 above 1, or the travel bracket is narrower than GRIP_TOLERANCE.
 */
export const GRIP_RATIO_TOLERANCE = 1e-9;
const GRIP_RATIO_AIM = 1e-10;

/** Prepares the shear stage (stage 5) and the grip rule of the case's liftability inputs. */
export function prepareLift(input: SqueezeInput): LiftStage {
  const stage = prepareShear(input);
  const c = stage.case;
  const rule = c.lift && {
    mass: fruitMass(c.model, c.equatorialRadius, c.axialRadius, c.lift.density),
    friction: c.lift.friction,
    safetyFactor: c.lift.safetyFactor,
    accelG: c.lift.accelG,
  };
  return { ...stage, rule };
}

/** The state at `travel` (m) with its lift ratio (see stateAt). */
export function liftStateAt(
  stage: LiftStage,
  travel: number,
  warm: Uint8Array | undefined,
  withShear: boolean,
): StateAt {
  const at = stateAt(stage, travel, warm, withShear);
  const ratio = stage.rule ? liftRatio(at.state.force, stage.rule) : null;
  return { ...at, state: { ...at.state, liftRatio: ratio } };
}

/** Runs the increments 1..steps of a prepared case (shear optional, for speed in sweeps). */
export function runIncrements(stage: LiftStage, withShear: boolean): IncrementTrack[] {
  const { travel, steps } = stage.case;
  const track: IncrementTrack[] = [];
  let warm: Uint8Array | undefined;
  for (let k = 1; k <= steps; k++) {
    const d = (travel * k) / steps;
    const { state, pressure, active } = liftStateAt(stage, d, warm, withShear);
    warm = active;
    track.push({ travel: d, active, state, pressure });
  }
  return track;
}

/** The nodal pressures (Pa) paired with the contact-node radii (m). */
export function profileOf(stage: LiftStage, pressure: Float64Array): PressurePoint[] {
  return Array.from(stage.r, (r, i) => ({ r, pressure: pressure[i] }));
}

/**
 * Liftability from the increments: the grip travel is searched between the bracketing increments
 * (the lift ratio is 0 at zero travel, where the pads only touch).
 */
export function findLiftability(stage: LiftStage, track: IncrementTrack[]): Liftability | null {
  const { rule } = stage;
  const lift = stage.case.lift;
  if (!rule || !lift) return null;
  const holdLoad = requiredHoldLoad(rule);
  const base = { mass: rule.mass, holdLoad, requiredForce: holdLoad / (2 * rule.friction) };
  const k = track.findIndex((t) => (t.state.liftRatio ?? 0) >= 1);
  if (k < 0) {
    const best = track[track.length - 1].state.liftRatio ?? 0;
    const reason = `the lift ratio reaches only ${best.toFixed(2)} at the full travel; squeeze further, or raise friction`;
    return { ...base, grip: null, reason };
  }
  const lo = k === 0 ? 0 : track[k - 1].travel;
  const fLo = k === 0 ? 0 : (track[k - 1].state.liftRatio ?? 0);
  const warm = k === 0 ? undefined : track[k - 1].active;
  const ratioAt = (d: number) => liftStateAt(stage, d, warm, false).state.liftRatio ?? 0;
  const travel = monotoneRoot(
    ratioAt,
    1 + GRIP_RATIO_AIM,
    { lo, hi: track[k].travel, fLo, fHi: track[k].state.liftRatio ?? 0 },
    { xTol: GRIP_TOLERANCE * stage.case.travel, fTol: GRIP_RATIO_TOLERANCE - GRIP_RATIO_AIM },
  );
  const { state, pressure } = liftStateAt(stage, travel, warm, true);
  const grip: GripPoint = {
    ...state,
    bruiseMargin: margin(lift.bruiseThreshold, state.peakPressure),
    shearMargin: margin(lift.failureShear, state.maxShear ?? 0),
    profile: profileOf(stage, pressure),
  };
  return { ...base, grip, reason: null };
}
