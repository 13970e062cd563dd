import { bisectGrip, liftRatio, margin, requiredHoldLoad } from './grip';
import { hertzComparison, type HertzComparison } from './hertz';
import { validateSqueezeInput, type SqueezeCase, type SqueezeInput } from './01-input';
import {
  describeState,
  padForce,
  prepareSqueeze,
  solveAt,
  type PreparedSqueeze,
  type SqueezeState,
} from './03-contact';
import type { MeshLevel } from '../types';

/** Contact pressure at one contact node: radius r (m) from the axis, pressure (Pa, compressive +). */
export interface PressurePoint {
  r: number;
  pressure: number;
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

/** Full result of a squeeze run, SI; never holds NaN or Infinity. */
export interface SqueezeResult {
  input: SqueezeCase;
  mesh: { level: MeshLevel; nodes: number; dofs: number; contactNodes: number };
  /** one state per increment, travel rising to the requested travel */
  steps: SqueezeState[];
  final: SqueezeState;
  /** pressure along the candidate contact nodes at the final travel */
  profile: PressurePoint[];
  liftability: Liftability | null;
  hertz: HertzComparison;
  warnings: string[];
}

/** Bisection tolerance on the grip travel, as a fraction of the requested travel. */
export const GRIP_TOLERANCE = 1e-5;

/** One increment as run: travel (m), final active set, state summary and nodal pressures (Pa). */
export interface IncrementTrack {
  travel: number;
  active: Uint8Array;
  state: SqueezeState;
  pressure: Float64Array;
}

/** Runs the increments 1..steps of a prepared case (shear optional, for speed in sweeps). */
export function runIncrements(prep: PreparedSqueeze, withShear: boolean): IncrementTrack[] {
  const { travel, steps } = prep.case;
  const track: IncrementTrack[] = [];
  let warm: Uint8Array | undefined;
  for (let k = 1; k <= steps; k++) {
    const d = (travel * k) / steps;
    const sol = solveAt(prep, d, warm);
    warm = sol.active;
    track.push({ travel: d, active: sol.active, ...describeState(prep, sol, d, withShear) });
  }
  return track;
}

function profileOf(prep: PreparedSqueeze, pressure: Float64Array): PressurePoint[] {
  return Array.from(prep.r, (r, i) => ({ r, pressure: pressure[i] }));
}

/** Liftability from the increments: bisects between the bracketing increments for the grip. */
export function findLiftability(
  prep: PreparedSqueeze,
  track: IncrementTrack[],
): Liftability | null {
  const { rule } = prep;
  const lift = prep.case.lift;
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
  const warm = k === 0 ? undefined : track[k - 1].active;
  const ratioAt = (d: number) => {
    return liftRatio(padForce(prep, solveAt(prep, d, warm)), rule);
  };
  const travel = bisectGrip(ratioAt, lo, track[k].travel, GRIP_TOLERANCE * prep.case.travel);
  const { state, pressure } = describeState(prep, solveAt(prep, travel, warm), travel, true);
  const grip: GripPoint = {
    ...state,
    bruiseMargin: margin(lift.bruiseThreshold, state.peakPressure),
    shearMargin: margin(lift.failureShear, state.maxShear ?? 0),
    profile: profileOf(prep, pressure),
  };
  return { ...base, grip, reason: null };
}

/** Warnings for a state: the pad's own (sharp edge) and contact spreading onto the rounded edge. */
export function squeezeWarnings(prep: PreparedSqueeze, state: SqueezeState): string[] {
  const warnings = [...prep.case.pad.warnings];
  const flat = prep.case.pad.flatRadius;
  if (flat !== null && state.contactRadius > flat) {
    warnings.push(
      'The contact spreads onto the rounded edge of the pad: the pressure rises at the edge, and ' +
        'a larger pad or a softer facing would spread the load.',
    );
  }
  return warnings;
}

/**
 * Squeeze check: two identical pads squeeze the fruit, each moving `travel` (m) toward the centre
 * in `steps` equal increments. Returns force, contact radius, pressures and subsurface shear per
 * increment (SI, compressive positive), the pressure profile at full travel, the grip point and
 * margins when liftability inputs are given, and Hertz figures for comparison.
 * @throws FemInputError (field named) for bad input; FemConvergenceError if contact does not settle
 */
export function runSqueeze(input: SqueezeInput): SqueezeResult {
  const prep = prepareSqueeze(validateSqueezeInput(input));
  const track = runIncrements(prep, true);
  const last = track[track.length - 1];
  const { body } = prep;
  return {
    input: prep.case,
    mesh: {
      level: prep.case.mesh,
      nodes: body.nodes,
      dofs: body.dofs,
      contactNodes: prep.r.length,
    },
    steps: track.map((t) => t.state),
    final: last.state,
    profile: profileOf(prep, last.pressure),
    liftability: findLiftability(prep, track),
    hertz: hertzComparison(prep.case, prep.case.travel, last.state.force),
    warnings: squeezeWarnings(prep, last.state),
  };
}
