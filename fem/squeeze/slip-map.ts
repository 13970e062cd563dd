/**
 * Slip map of a pad on the fruit: the Ciavarella–Jäger partial slip (slip-superposition.ts) on
 * the finite-element normal pressure of the squeeze, at a given travel or at the grip point.
 */
import { STANDARD_GRAVITY } from '../constants';
import { FemInputError } from '../errors';
import { requirePositive } from '../validate';
import type { SqueezeInput } from './01-input';
import { liftStateAt, prepareLift, type LiftStage } from './06-liftability';
import { runCase, type CaseRun } from './07-run';
import { ciavarellaJager, type NormalContactState, type SlipMap } from './slip-superposition';

/** The slip map at the grip point and the per-pad tangential loads of the lift. */
export interface GripSlipMap {
  /** load per pad actually carried while lifting, m(g + a)/2, N (N/m) */
  liftLoad: number;
  /** design load per pad SF·m(g + a)/2; at the grip point μP reaches it (lift ratio 1) */
  designLoad: number;
  /** grip travel, m; null if the travel never lifts the fruit */
  travel: number | null;
  /** the slip map under `tangentialLoad` (default liftLoad); null without a grip */
  map: SlipMap | null;
  /** why there is no grip, or null */
  reason: string | null;
}

function stateAt(stage: LiftStage, travel: number, warm?: Uint8Array) {
  const at = liftStateAt(stage, travel, warm, false);
  const state: NormalContactState = {
    force: at.state.force,
    contactRadius: at.state.contactRadius,
    pressure: at.pressure,
  };
  return { state, active: at.active };
}

function mapAt(stage: LiftStage, travel: number, tangentialLoad: number, friction: number) {
  const current = stateAt(stage, travel);
  let warm = current.active;
  const history = (s: number) => {
    const at = stateAt(stage, s, warm);
    warm = at.active;
    return at.state;
  };
  return ciavarellaJager(stage.r, current.state, history, travel, tangentialLoad, friction);
}

/**
 * Slip map with the pads squeezed to `travel` (m, per pad) and a tangential load per pad
 * `tangentialLoad` (N, N/m in plane strain), friction μ from the input. The smaller contact p* is
 * solved on the same body at the travel where the pad force is P − T/μ, so it carries the finite
 * body, the pad's edge and the mesh exactly as the squeeze does.
 * @throws FemInputError naming the field (friction missing, travel, tangentialLoad)
 */
export function slipMapAtTravel(
  input: SqueezeInput,
  travel: number,
  tangentialLoad: number,
): SlipMap {
  const stage = prepareLift({ ...input, travel: requirePositive('travel', travel) });
  const friction = stage.case.lift?.friction;
  if (friction === undefined) {
    throw new FemInputError('friction', 'friction (with density) is needed for the slip map');
  }
  return mapAt(stage, travel, tangentialLoad, friction);
}

/**
 * Slip map at the grip point of `input` (least travel that lifts, as runSqueeze). The default
 * tangential load per pad is the load the pads carry while lifting, m(g + a)/2: the grip rule's
 * design load SF·m(g + a)/2 equals μP at the grip by construction, so under it the grip point is
 * on the verge of gross sliding (pass it as `tangentialLoad` to see that).
 * @throws FemInputError naming the field (density and friction are needed)
 */
export function slipMapAtGrip(input: SqueezeInput, tangentialLoad?: number): GripSlipMap {
  return slipMapOfRun(runCase(input, false), tangentialLoad);
}

/**
 * The slip map at the grip point of a case already run (runCase), as slipMapAtGrip, so a caller
 * that has the squeeze does not solve it again. The map is taken on the body the grip was found
 * on (the regraded one when the run regraded for the grip's contact).
 * @throws FemInputError naming the field (density and friction are needed)
 */
export function slipMapOfRun(run: CaseRun, tangentialLoad?: number): GripSlipMap {
  const { liftability } = run;
  const stage = run.gripStage ?? run.stage;
  const lift = stage.case.lift;
  if (!liftability || !lift) {
    throw new FemInputError('density', 'density and friction are needed for the slip map');
  }
  const liftLoad = (liftability.mass * STANDARD_GRAVITY * (1 + lift.accelG)) / 2;
  const designLoad = liftability.holdLoad / 2;
  const grip = liftability.grip;
  if (!grip) return { liftLoad, designLoad, travel: null, map: null, reason: liftability.reason };
  const T = tangentialLoad ?? liftLoad;
  const map = mapAt(stage, grip.travel, T, lift.friction);
  return { liftLoad, designLoad, travel: grip.travel, map, reason: null };
}
