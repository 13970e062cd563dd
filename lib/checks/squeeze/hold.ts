/**
 * The held grip: a gripper closes on the fruit and holds it at fixed travel for the transfer
 * while the flesh relaxes, so the pad force falls. Pure (runs in the worker and in tests).
 *
 * At a fixed travel the pad force follows the relaxation of the flesh, F(t) = F₀ · ψ(t), with
 * ψ Peleg's retained share (fem/closed-form/relaxation.ts says why this carries over from a
 * relaxation test to a grip, and when it does not). The lift ratio falls with it. Two answers:
 * at the grip point found at t = 0 (lift ratio 1 with the safety factor SF), the fruit really
 * slips once ψ(t) < 1/SF; and the travel that still lifts with SF at the end of the hold is the
 * grip point of the same squeeze with SF ÷ ψ(T), because 2μF₀ψ(T) ≥ SF·m(g + a) is
 * 2μF₀ ≥ (SF ÷ ψ(T))·m(g + a). The bruise margin there is judged at t = 0, the highest pressure.
 */
import {
  pelegRetained,
  pelegTimeToShare,
  runCase,
  squeezeResultOf,
  type PelegConstants,
  type SqueezeInput,
} from '@/fem';
import { climb, type EvidenceSet } from '@/lib/evidence/ladder';
import { m, ph, type Text } from '@/lib/phrase';
import type { UsedValue } from '../used-value';

const r4 = (v: number) => Number(v.toPrecision(4));

/** The hold the check is asked about: its duration and the fruit's relaxation, if known. */
export interface HoldInput {
  seconds: number;
  relaxation: PelegConstants | null;
}

/**
 * Peleg's k₁ and k₂ of the fruit from the ladder, as one pair from one source on one rung (the
 * cultivar's own, else the commodity record's); null where no published pair exists — a typical
 * relaxation is never assumed.
 */
export function relaxationOf(set: EvidenceSet): { k1: UsedValue; k2: UsedValue } | null {
  const k1 = climb(set, { quantity: 'relaxation_k1' }, { unit: 's' });
  if (!k1?.picked || (k1.used.rung !== 'own' && k1.used.rung !== 'commodity')) return null;
  const source = k1.picked.source?.id ?? null;
  const k2 = climb(
    set,
    {
      quantity: 'relaxation_k2',
      accept: (v) =>
        (v.source?.id ?? null) === source &&
        v.method === k1.picked!.method &&
        v.storage === k1.picked!.storage,
    },
    { unit: '–' },
  );
  if (!k2 || k2.used.rung !== k1.used.rung) return null;
  return { k1: k1.used, k2: k2.used };
}

const CURVE_POINTS = 41;

/** The held grip's answer (SI in named units), or its absence explained. */
export function holdJson(input: SqueezeInput, hold: HoldInput, gripForceN: number | null) {
  const seconds = hold.seconds;
  const relax = hold.relaxation;
  if (!relax)
    return {
      seconds,
      relaxation: false,
      retained_at_end: null,
      safety_at_end: null,
      grip_slips_after_s: null,
      curve: null,
      held: null,
      held_reason: null,
    };
  const sf = input.safetyFactor ?? 1;
  const retained = pelegRetained(seconds, relax);
  const slipsAfter = pelegTimeToShare(1 / sf, relax);
  const held = squeezeResultOf(
    runCase({ ...input, safetyFactor: sf / retained }, true),
  ).liftability;
  const heldGrip = held?.grip ?? null;
  const curve = Array.from({ length: CURVE_POINTS }, (_, i) => {
    const t = (seconds * i) / (CURVE_POINTS - 1);
    const psi = pelegRetained(t, relax);
    return {
      t_s: r4(t),
      grip_force_n: gripForceN === null ? null : r4(gripForceN * psi),
      grip_lift_ratio: r4(psi),
      held_force_n: heldGrip ? r4(heldGrip.force * psi) : null,
      held_lift_ratio: heldGrip ? r4(psi / retained) : null,
    };
  });
  return {
    seconds,
    relaxation: true,
    retained_at_end: r4(retained),
    safety_at_end: r4(sf * retained),
    grip_slips_after_s: slipsAfter === null ? null : r4(slipsAfter),
    curve,
    held: heldGrip
      ? {
          travel_per_pad_mm: r4(heldGrip.travel * 1e3),
          force_n: r4(heldGrip.force),
          force_end_n: r4(heldGrip.force * retained),
          peak_pressure_kpa: r4(heldGrip.peakPressure / 1e3),
          bruise_margin:
            heldGrip.bruiseMargin === null ? null : Number(heldGrip.bruiseMargin.toPrecision(3)),
        }
      : null,
    held_reason: heldGrip ? null : (held?.reason ?? 'no liftability inputs'),
  };
}

const pct = (x: number) => `${Math.round(x * 100)} %`;

/** Plain words for the hold, where it changes what the engineer should do. */
export function holdWarnings(h: ReturnType<typeof holdJson>): Text[] {
  if (!h.relaxation)
    return [
      ph`No relaxation data for this fruit on any rung: the grip force is taken as held for the whole ${m(h.seconds, 's')}, which overstates the grip — fruit flesh relaxes under a held grip. Upload a relaxation test to the cultivar's draft.`,
    ];
  const out: Text[] = [];
  const slips = h.grip_slips_after_s;
  if (slips !== null && slips <= h.seconds)
    out.push(
      ph`Held at the lift point, the flesh relaxes to ${pct(h.retained_at_end!)} of the grip force in ${m(h.seconds, 's')}: the safety factor is used up after ${m(slips, 's')} and the fruit slips.`,
    );
  if (h.held)
    out.push(
      ph`To still lift with the safety factor after ${m(h.seconds, 's')}, close to ${m(h.held.travel_per_pad_mm, 'mm')} per pad (${m(h.held.force_n, 'N')} at first, ${m(h.held.force_end_n, 'N')} at the end)${h.held.bruise_margin === null ? '' : `; the bruise margin there is ${h.held.bruise_margin}, judged at the first, highest pressure`}.`,
    );
  else if (h.held_reason)
    out.push(`No travel holds the fruit to the end of the hold: ${h.held_reason}.`);
  return out;
}
