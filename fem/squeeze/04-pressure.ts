/**
 * Stage 4 of the squeeze pipeline: nodal contact pressure, contact radius and mean pressure from
 * the contact solution of stage 3.
 */
import type { SqueezeInput } from './01-input';
import {
  padForce,
  prepareContact,
  solveAt,
  type ContactStage,
  type StageSolution,
} from './03-contact';
import { padReach } from './pad';
import { recoverPressure } from './pressure-recovery';

/** The contact stage plus the pad's outer radius, which bounds the contact radius. */
export interface PressureStage extends ContactStage {
  /** outer radius of the pad face, m (Infinity for a plate) */
  reach: number;
}

/** Contact and pressures at one travel, SI; pressures compressive positive. */
export interface PressureAt {
  /** the contact solution: point and node forces N (N/m), displacements and gaps m */
  solution: StageSolution;
  /** normal force of one pad, N (N/m in plane strain) */
  force: number;
  /** recovered nodal pressure, Pa (zero out of contact) */
  pressure: Float64Array;
  /** contact radius a (half-width in plane strain), m */
  contactRadius: number;
  /** largest nodal pressure, Pa */
  peakPressure: number;
  /** force / (π a²), or force / (2a) in plane strain, Pa; 0 without contact */
  meanPressure: number;
}

/** Prepares the contact stage (stage 3) and notes the pad's reach. */
export function preparePressure(input: SqueezeInput): PressureStage {
  const stage = prepareContact(input);
  return { ...stage, reach: padReach(stage.case.pad) };
}

/** Solves the contact at `travel` (m), warm-started from `warm`, and recovers the pressures. */
export function pressureAt(stage: PressureStage, travel: number, warm?: Uint8Array): PressureAt {
  const solution = solveAt(stage, travel, warm);
  const model = stage.case.model;
  const pressure = recoverPressure(stage.r, solution.force, solution.active, model, stage.gap);
  const force = padForce(stage, solution);
  const a = contactRadius(stage.r, solution.gap, solution.active, stage.reach);
  const meanPressure =
    a > 0 ? (model === 'axisymmetric' ? force / (Math.PI * a * a) : force / (2 * a)) : 0;
  return {
    solution,
    force,
    pressure,
    contactRadius: a,
    peakPressure: Math.max(...pressure),
    meanPressure,
  };
}

/**
 * Contact radius (m), where the gap closes between the last node in contact k and the first one
 * out k+1 (not snapped to a node). Outside a Hertz-type contact the gap opens as (r − a)^{3/2}
 * (Johnson, Contact Mechanics, 1985, §4.2 [memory]), so s^{2/3} is extrapolated linearly from
 * nodes k+1 and k+2 to zero. The result is held below min(r_{k+1}, reach) (`reach`: the pad's
 * outer radius) and above r_{k−1}, not r_k: when node k has only just touched and carries almost
 * no force the gap closes a little inside it, and clamping at r_k doubled the error against
 * Hertz on the balanced mesh (2.5 % → 1.2 % worst over 0.2–2 mm travel of a 40 mm sphere).
 * Without two finite gaps outside (the pad ends first) it returns r_k, the smaller, safer radius.
 */
export function contactRadius(
  r: Float64Array,
  gap: Float64Array,
  active: Uint8Array,
  reach: number,
): number {
  let k = -1;
  active.forEach((a, i) => a && (k = i));
  if (k < 0) return 0;
  if (k === r.length - 1) return r[k];
  const hi = Math.min(r[k + 1], Math.max(reach, r[k]));
  const lo = k > 0 ? r[k - 1] : 0;
  const s1 = gap[k + 1];
  const s2 = k + 2 < r.length ? gap[k + 2] : NaN;
  if (!(Number.isFinite(s1) && Number.isFinite(s2) && s1 > 0 && s2 > s1)) return Math.min(r[k], hi);
  const t1 = Math.cbrt(s1 * s1);
  const t2 = Math.cbrt(s2 * s2);
  const a = r[k + 1] - (t1 * (r[k + 2] - r[k + 1])) / (t2 - t1);
  return Math.min(Math.max(a, lo), hi);
}
