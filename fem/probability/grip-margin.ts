import type { SqueezeInput } from '../squeeze/01-input';
import {
  findLiftability,
  liftStateAt,
  prepareLift,
  type IncrementTrack,
  type LiftStage,
} from '../squeeze/06-liftability';
import { regradeRadius } from '../squeeze/07-run';

/** Bruise margin at the grip point of one input; `margin` is null when the travel never lifts. */
export interface GripSample {
  margin: number | null;
  /** shear margin at the grip (null without failureShear or grip) */
  shearMargin: number | null;
  /** grip travel (m), pad force (N) and peak pressure (Pa) at the grip; null if not lifted */
  travel: number | null;
  force: number | null;
  peakPressure: number | null;
  /** the increment 1..steps whose travel first lifts (a good first guess for a similar input) */
  increment: number | null;
  /** contact active set of the last increment solved (a warm start for a similar input) */
  active: Uint8Array | undefined;
}

/** Where to start the search: an increment and an active set, e.g. from a similar input. */
export interface GripHint {
  increment?: number;
  active?: Uint8Array;
}

/**
 * The bruise margin (threshold / peak pressure) at the grip point of `input`, the grip point of
 * runSqueeze: its grip search (findLiftability) runs on the two increments that bracket the
 * lift, which are all it reads, so the result is the same to the last bit. Faster because only
 * those increments are solved: the search starts at the hinted increment (e.g. a similar
 * input's) and jumps by the power law F ∝ d^{3/2} of a Hertz contact (Johnson, Contact
 * Mechanics, 1985, ch. 4); `hint` changes only the search order and warm start, not the result
 * (the contact solution is unique). Needs density and friction; the margin also bruiseThreshold.
 * @throws FemInputError for bad input or a contact that spreads past the modelled zone
 */
export function gripMargin(input: SqueezeInput, hint: GripHint = {}): GripSample {
  const stage = prepareLift(input);
  const { travel, steps } = stage.case;
  let warm = hint.active?.length === stage.r.length ? hint.active : undefined;
  const solved = new Map<number, IncrementTrack>();
  const ratioAt = (k: number) => {
    const d = (travel * k) / steps; // as the increments of runSqueeze
    const at = liftStateAt(stage, d, warm, false);
    warm = at.active;
    solved.set(k, { travel: d, ...at });
    return at.state.liftRatio ?? 0;
  };
  const k = firstLifting(stage, ratioAt, hint.increment ?? Math.ceil(steps / 2));
  const none = { margin: null, shearMargin: null, travel: null, force: null, peakPressure: null };
  if (k === null) return { ...none, increment: null, active: warm };
  const track = [solved.get(k - 1), solved.get(k)].filter((t): t is IncrementTrack => !!t);
  const grip = findLiftability(stage, track)?.grip;
  if (!grip) return { ...none, increment: k, active: warm };
  // As runSqueeze: a grip with too few points in contact is found again on a mesh graded to it.
  const regrade = input.meshContactRadius === undefined ? regradeRadius(stage, grip) : null;
  if (regrade !== null) {
    const again = gripMargin({ ...input, meshContactRadius: regrade }, { increment: k });
    return { ...again, active: warm };
  }
  return {
    margin: grip.bruiseMargin,
    shearMargin: grip.shearMargin,
    travel: grip.travel,
    force: grip.force,
    peakPressure: grip.peakPressure,
    increment: k,
    active: warm,
  };
}

/** First increment 1..steps whose travel lifts (ratio ≥ 1), or null when none does. */
function firstLifting(
  stage: LiftStage,
  ratioAt: (increment: number) => number,
  guess: number,
): number | null {
  const { steps } = stage.case;
  let lo = 0; // ratio < 1 at increment lo (travel 0 carries nothing)
  let hi = steps + 1; // lifts at hi, or hi is past the last increment
  let k = Math.min(Math.max(Math.round(guess), 1), steps);
  while (hi - lo > 1) {
    const ratio = ratioAt(k);
    if (ratio >= 1) hi = k;
    else lo = k;
    // Travel where the ratio would reach 1 if F ∝ d^{3/2}; a zero ratio gives no estimate.
    const jump = ratio > 0 ? Math.ceil(k * ratio ** (-2 / 3)) : 2 * k;
    k = Math.min(Math.max(jump, lo + 1), hi - 1);
  }
  return hi > steps ? null : hi;
}
