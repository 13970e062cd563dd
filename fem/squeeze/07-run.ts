/**
 * Stage 7 of the squeeze pipeline: one squeeze case run through the increments and the grip of
 * stage 6, with its pressure profile, Hertz comparison and warnings.
 */
import type { MeshLevel } from '../types';
import type { SqueezeCase, SqueezeInput } from './01-input';
import type { SqueezeState } from './05-shear';
import {
  findLiftability,
  prepareLift,
  profileOf,
  runIncrements,
  type IncrementTrack,
  type LiftStage,
  type Liftability,
  type PressurePoint,
} from './06-liftability';
import { hertzComparison, type HertzComparison } from './hertz';

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

/** A case run through its increments and grip search, before it is summarised. */
export interface CaseRun {
  stage: LiftStage;
  track: IncrementTrack[];
  liftability: Liftability | null;
}

/** Prepares `input` (stage 6) and runs its increments (shear optional) and grip search. */
export function runCase(input: SqueezeInput, withShear: boolean): CaseRun {
  const stage = prepareLift(input);
  const track = runIncrements(stage, withShear);
  return { stage, track, liftability: findLiftability(stage, track) };
}

/** Warnings for a state: the pad's own (sharp edge) and contact spreading onto the rounded edge. */
export function squeezeWarnings(stage: LiftStage, state: SqueezeState): string[] {
  const warnings = [...stage.case.pad.warnings];
  const flat = stage.case.pad.flatRadius;
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
  const { stage, track, liftability } = runCase(input, true);
  const last = track[track.length - 1];
  const { body } = stage;
  return {
    input: stage.case,
    mesh: {
      level: stage.case.mesh,
      nodes: body.nodes,
      dofs: body.dofs,
      contactNodes: stage.r.length,
    },
    steps: track.map((t) => t.state),
    final: last.state,
    profile: profileOf(stage, last.pressure),
    liftability,
    hertz: hertzComparison(stage.case, stage.case.travel, last.state.force),
    warnings: squeezeWarnings(stage, last.state),
  };
}
