/**
 * Stage 7 of the squeeze pipeline: one squeeze case run through the increments and the grip of
 * stage 6, regraded once when its contact is under-resolved, with its pressure profile, Hertz
 * comparison and warnings.
 */
import { contactBandOf, contactScaleOf } from '../body/grading';
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
import { padReach } from './pad';
import { stateWarnings } from './state-warnings';
import { inputWarnings, MIN_CONTACT_NODES, uniqueWarnings, type SqueezeWarning } from './warnings';

/** Size and grading of the body a result was computed on. */
export interface MeshSummary {
  level: MeshLevel;
  nodes: number;
  dofs: number;
  /** candidate contact nodes */
  contactNodes: number;
  /** contact radius the mesh near the pole is graded to, m */
  gradedContactRadius: number;
  /** node spacing of the refined band at the pad's edge, m; null without one */
  edgeBandSpacing: number | null;
}

/** Full result of a squeeze run, SI; never holds NaN or Infinity. */
export interface SqueezeResult {
  input: SqueezeCase;
  /** the body of the increments and the final state */
  mesh: MeshSummary;
  /** the body the grip was found on when the run regraded for it (a small grip contact), else null */
  gripMesh: MeshSummary | null;
  /** one state per increment, travel rising to the requested travel */
  steps: SqueezeState[];
  final: SqueezeState;
  /** pressure along the contact points at the final travel */
  profile: PressurePoint[];
  liftability: Liftability | null;
  hertz: HertzComparison;
  /** plain-word warnings with stable codes (changed from string[] in this edition) */
  warnings: SqueezeWarning[];
}

/** A case run through its increments and grip search, before it is summarised. */
export interface CaseRun {
  stage: LiftStage;
  track: IncrementTrack[];
  liftability: Liftability | null;
  /** the regraded stage the grip was found on, when it was not `stage` */
  gripStage: LiftStage | null;
}

function runOnce(input: SqueezeInput, withShear: boolean): Omit<CaseRun, 'gripStage'> {
  const stage = prepareLift(input);
  const track = runIncrements(stage, withShear);
  return { stage, track, liftability: findLiftability(stage, track) };
}

/**
 * The contact radius (m) to regrade the mesh to when `state` has fewer than MIN_CONTACT_NODES
 * points in contact or its shear could not be sampled, or null when the state is resolved or
 * regrading would not change the mesh (the contact-scale band is the same).
 */
export function regradeRadius(stage: LiftStage, state: SqueezeState): number | null {
  if (!(state.force > 0)) return null;
  if (state.activeNodes >= MIN_CONTACT_NODES && state.maxShearUnavailable === null) return null;
  const band = contactBandOf(state.contactRadius / stage.case.equatorialRadius);
  return band === stage.body.key.contactBand ? null : state.contactRadius;
}

/**
 * Prepares `input` (stage 6) and runs its increments (shear optional) and grip search. When the
 * final state or the grip has fewer than MIN_CONTACT_NODES points in contact, or its shear could
 * not be sampled, that state is taken from a second run on a mesh graded to its contact (unless
 * the input fixes `meshContactRadius`): the increments and final state from a run graded to the
 * final contact, the grip from one graded to the grip's (the same run when both fall in one
 * contact-scale band). Each depends only on the first run and its own contact, so a caller can
 * repeat the grip alone with regradeRadius.
 */
export function runCase(input: SqueezeInput, withShear: boolean): CaseRun {
  const first = runOnce(input, withShear);
  if (input.meshContactRadius !== undefined) return { ...first, gripStage: null };
  const grip = first.liftability?.grip ?? null;
  const forFinal = regradeRadius(first.stage, first.track[first.track.length - 1].state);
  const forGrip = grip ? regradeRadius(first.stage, grip) : null;
  const main =
    forFinal === null ? first : runOnce({ ...input, meshContactRadius: forFinal }, withShear);
  if (forGrip === null) {
    return {
      ...main,
      liftability: first.liftability,
      gripStage: main === first ? null : first.stage,
    };
  }
  const R = first.stage.case.equatorialRadius;
  const shared = forFinal !== null && contactBandOf(forFinal / R) === contactBandOf(forGrip / R);
  const gripRun = shared ? main : runOnce({ ...input, meshContactRadius: forGrip }, false);
  return {
    ...main,
    liftability: gripRun.liftability,
    gripStage: gripRun === main ? null : gripRun.stage,
  };
}

/** Mesh summary of a stage's body. */
export function meshSummary(stage: LiftStage): MeshSummary {
  const { body, case: c } = stage;
  const edge = body.key.edgeBand;
  return {
    level: c.mesh,
    nodes: body.nodes,
    dofs: body.dofs,
    contactNodes: body.contactR.length,
    gradedContactRadius: contactScaleOf(body.key.contactBand ?? 0) * c.equatorialRadius,
    edgeBandSpacing: edge ? 2 ** (edge.spacing / 2) * c.equatorialRadius : null,
  };
}

/**
 * The warnings of a case with one of its states (`where` names it in the messages, e.g.
 * 'at the grip'): the pad's, the inputs' and the state's (see stateWarnings), each once.
 */
export function squeezeWarnings(
  stage: LiftStage,
  state: SqueezeState,
  where = 'at the full travel',
): SqueezeWarning[] {
  const c = stage.case;
  return uniqueWarnings([
    ...c.pad.warnings,
    ...inputWarnings(c),
    ...stateWarnings(c, padReach(c.pad), state, where),
  ]);
}

/**
 * Squeeze check: two identical pads squeeze the fruit, each moving `travel` (m) toward the centre
 * in `steps` equal increments. Returns force, contact radius, pressures and subsurface shear per
 * increment (SI, compressive positive), the pressure profile at full travel, the grip point and
 * margins when liftability inputs are given, Hertz figures for comparison, and warnings.
 * @throws FemInputError (field named) for bad input; FemConvergenceError if contact does not settle
 */
export function runSqueeze(input: SqueezeInput): SqueezeResult {
  return squeezeResultOf(runCase(input, true));
}

/** The squeeze result of a case already run with shear (runCase(input, true)), as runSqueeze. */
export function squeezeResultOf(run: CaseRun): SqueezeResult {
  const { stage, track, liftability, gripStage } = run;
  const last = track[track.length - 1];
  const c = stage.case;
  const grip = liftability?.grip ?? null;
  const warnings = [
    ...squeezeWarnings(stage, last.state),
    ...(grip ? stateWarnings(c, padReach(c.pad), grip, 'at the grip') : []),
  ];
  return {
    input: c,
    mesh: meshSummary(stage),
    gripMesh: gripStage ? meshSummary(gripStage) : null,
    steps: track.map((t) => t.state),
    final: last.state,
    profile: profileOf(stage, last.pressure),
    liftability,
    hertz: hertzComparison(c, c.travel, last.state.force),
    warnings: uniqueWarnings(warnings),
  };
}
