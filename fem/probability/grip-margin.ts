import {
  bisectGrip,
  GRIP_TOLERANCE,
  liftStateAt,
  margin,
  prepareLift,
  type LiftStage,
  type SqueezeInput,
  type SqueezeState,
} from '../index';

/** Bruise margin at the grip point of one input; `margin` is null when the travel never lifts. */
export interface GripSample {
  margin: number | null;
  /** grip travel (m), pad force (N) and peak pressure (Pa) at the grip; null if not lifted */
  travel: number | null;
  force: number | null;
  peakPressure: number | null;
  /** the increment 1..steps whose travel first lifts (a good first guess for a similar input) */
  increment: number | null;
  /** contact active set of the last solve (a warm start for a similar input) */
  active: Uint8Array | undefined;
}

/** Where to start the search: an increment and an active set, e.g. from a similar input. */
export interface GripHint {
  increment?: number;
  active?: Uint8Array;
}

/**
 * The bruise margin (threshold / peak pressure) at the grip point of `input`, the same grip point
 * as runSqueeze: the first of the equal increments of the travel that lifts the fruit, then the
 * bisection between it and the increment before, to GRIP_TOLERANCE. Faster because it solves
 * only the increments it needs: it starts at the hinted increment (e.g. a similar input's) and
 * jumps by the power law F ∝ d^{3/2} of a Hertz contact (Johnson, Contact Mechanics, 1985, ch. 4);
 * `hint` changes only the search order and warm start, not the result (the contact solution is
 * unique). Needs density and friction; the margin also needs bruiseThreshold.
 * @throws FemInputError for bad input or a contact that spreads past the modelled zone
 */
export function gripMargin(input: SqueezeInput, hint: GripHint = {}): GripSample {
  const stage = prepareLift(input);
  const threshold = stage.case.lift?.bruiseThreshold ?? null;
  const { travel, steps } = stage.case;
  let warm = hint.active?.length === stage.r.length ? hint.active : undefined;
  const lifting = new Map<number, SqueezeState>();
  const ratioAt = (d: number) => {
    const at = liftStateAt(stage, d, warm, false);
    warm = at.active;
    const ratio = at.state.liftRatio ?? 0;
    if (ratio >= 1) lifting.set(d, at.state);
    return ratio;
  };
  const k = firstLifting(stage, ratioAt, hint.increment ?? Math.ceil(steps / 2));
  if (k === null) {
    const none = { margin: null, travel: null, force: null, peakPressure: null };
    return { ...none, increment: null, active: warm };
  }
  const lo = k === 1 ? 0 : (travel * (k - 1)) / steps;
  const grip = bisectGrip(ratioAt, lo, (travel * k) / steps, GRIP_TOLERANCE * travel);
  const state = lifting.get(grip) ?? liftStateAt(stage, grip, warm, false).state;
  return {
    margin: threshold === null ? null : margin(threshold, state.peakPressure),
    travel: grip,
    force: state.force,
    peakPressure: state.peakPressure,
    increment: k,
    active: warm,
  };
}

/** First increment 1..steps whose travel lifts (ratio ≥ 1), or null when none does. */
function firstLifting(
  stage: LiftStage,
  ratioAt: (travel: number) => number,
  guess: number,
): number | null {
  const { travel, steps } = stage.case;
  let lo = 0; // ratio < 1 at increment lo (travel 0 carries nothing)
  let hi = steps + 1; // lifts at hi, or hi is past the last increment
  let k = Math.min(Math.max(Math.round(guess), 1), steps);
  while (hi - lo > 1) {
    const ratio = ratioAt((travel * k) / steps);
    if (ratio >= 1) hi = k;
    else lo = k;
    // Travel where the ratio would reach 1 if F ∝ d^{3/2}; a zero ratio gives no estimate.
    const jump = ratio > 0 ? Math.ceil(k * ratio ** (-2 / 3)) : 2 * k;
    k = Math.min(Math.max(jump, lo + 1), hi - 1);
  }
  return hi > steps ? null : hi;
}
