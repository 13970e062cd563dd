/**
 * A move that is not straight up, and a grip off the fruit's centre of mass. Pure (runs in the
 * worker and in tests).
 *
 * The pads carry by friction the fruit's weight and inertia, m·(g + a_v) up and m·a_h sideways:
 * a resultant m·a_r with a_r = √((g + a_v)² + a_h²), so the grip point is found for a_r (the
 * squeeze's `accelG` is a_r/g − 1). With the pad axis at a distance e from the centre of mass,
 * the same load turns the fruit about the pad axis with a torque of at most m·a_r·e (the load
 * square to the offset). Each contact resists that torque by friction; at full slip a contact
 * with pressure p(r) gives M = μ∫p(r)·r dA — for Hertz pressure (3π/16)·μ·P·a (Lubkin J.L., "The
 * torsion of elastic spheres in contact", J. Appl. Mech. 18:183–187, 1951; Johnson, Contact
 * Mechanics, 1985, §7.4). Force and torque together slip a contact earlier than either alone;
 * the limit taken is the ellipse (u_force² + u_twist² ≤ 1) of the limit-surface model of
 * Howe R.D. & Cutkosky M.R., "Practical force-motion models for sliding manipulation", Int. J.
 * Robotics Research 15(6):557–572, 1996 [from memory], with each utilisation carrying the
 * safety factor.
 */
import { STANDARD_GRAVITY } from '@/fem';
import { m, ph, type Text } from '@/lib/phrase';

const r4 = (v: number) => Number(v.toPrecision(4));

/** The move and the grip's offset as typed: accelerations in m/s², offset in mm. */
export interface MoveInput {
  verticalMs2: number;
  horizontalMs2: number;
  offsetMm: number;
}

/** a_r/g − 1: the upward acceleration (in g) whose load equals the resultant's. */
export function resultantAccelG(verticalMs2: number, horizontalMs2: number): number {
  return Math.hypot(STANDARD_GRAVITY + verticalMs2, horizontalMs2) / STANDARD_GRAVITY - 1;
}

/**
 * The torque one pad resists at full slip, N·m: μ·∫p(r)·r·2πr dr over the contact, by the
 * trapezoid rule on the pressure profile (r in m, pressure in Pa, negative pressures as 0).
 */
export function torqueCapacity(profile: { r: number; pressure: number }[], friction: number) {
  let m = 0;
  for (let i = 1; i < profile.length; i++) {
    const a = profile[i - 1];
    const b = profile[i];
    const fa = Math.max(a.pressure, 0) * 2 * Math.PI * a.r * a.r;
    const fb = Math.max(b.pressure, 0) * 2 * Math.PI * b.r * b.r;
    m += ((fa + fb) / 2) * (b.r - a.r);
  }
  return friction * m;
}

/** One squeeze state as the result lists it (display units in the keys). */
interface StepView {
  travel_per_pad_mm: number | null;
  force_n: number | null;
  contact_radius_mm: number | null;
  peak_pressure_kpa: number | null;
}

export interface TwistArgs {
  move: MoveInput;
  massKg: number;
  friction: number;
  safetyFactor: number;
  /** the grip point: pad force N, contact radius mm, pressure profile (mm, kPa) */
  grip: {
    force_n: number;
    contact_radius_mm: number;
    profile: { r_mm: number | null; pressure_kpa: number | null }[];
  };
  steps: StepView[];
  /** static bruise threshold, kPa, for the margin at the travel that holds the twist */
  thresholdKpa: number | null;
}

/** The twist of an off-centre grip against the contacts' torsional friction, in named units. */
export function twistJson(a: TwistArgs) {
  const g = STANDARD_GRAVITY;
  const ar = Math.hypot(g + a.move.verticalMs2, a.move.horizontalMs2);
  const load = a.massKg * ar;
  const torque = load * (a.move.offsetMm / 1000);
  const profile = a.grip.profile
    .filter((p) => p.r_mm !== null && p.pressure_kpa !== null)
    .map((p) => ({ r: p.r_mm! / 1000, pressure: p.pressure_kpa! * 1000 }));
  const perPad = torqueCapacity(profile, a.friction);
  const capacity = 2 * perPad;
  const uLift = (a.safetyFactor * load) / (2 * a.friction * a.grip.force_n);
  const uTwist = capacity > 0 ? (a.safetyFactor * torque) / capacity : Infinity;
  const combined = Math.hypot(uLift, uTwist);
  // The torque capacity as a share of μ·F·a (Hertz: 3π/16 = 0.589) carries the grip's pressure
  // shape to the other travels of the squeeze, whose profiles are not kept.
  const kappa = perPad / (a.friction * a.grip.force_n * (a.grip.contact_radius_mm / 1000));
  const held = a.move.offsetMm > 0 && combined > 1 ? holdingTravel(a, load, torque, kappa) : null;
  return {
    offset_mm: a.move.offsetMm,
    resultant_acceleration_m_s2: r4(ar),
    load_n: r4(load),
    torque_n_m: r4(torque),
    capacity_n_m: r4(capacity),
    shape_factor: r4(kappa),
    lift_utilisation: r4(uLift),
    twist_utilisation: Number.isFinite(uTwist) ? r4(uTwist) : null,
    combined_utilisation: Number.isFinite(combined) ? r4(combined) : null,
    governs: uTwist > uLift ? ('twist' as const) : ('lift' as const),
    holds_at_grip: combined <= 1 + 1e-6,
    holding: held,
  };
}

/**
 * The least travel of the squeeze's steps at which force and twist together hold, with the
 * torque capacity taken as κ·μ·F·a (κ from the grip) — log–log between the steps around it.
 */
function holdingTravel(a: TwistArgs, load: number, torque: number, kappa: number) {
  const util = (s: StepView) => {
    const f = s.force_n ?? 0;
    const r = (s.contact_radius_mm ?? 0) / 1000;
    if (!(f > 0) || !(r > 0)) return Infinity;
    const uL = (a.safetyFactor * load) / (2 * a.friction * f);
    const uT = (a.safetyFactor * torque) / (2 * kappa * a.friction * f * r);
    return Math.hypot(uL, uT);
  };
  const k = a.steps.findIndex((s) => util(s) <= 1);
  if (k < 0)
    return {
      travel_per_pad_mm: null,
      force_n: null,
      peak_pressure_kpa: null,
      bruise_margin: null,
      reason: `force and twist together are ${r4(util(a.steps[a.steps.length - 1]))} of what the grip holds at the full travel; squeeze further, grip nearer the centre of mass, or use larger or grippier pads`,
    };
  const hi = a.steps[k];
  const lo = k > 0 ? a.steps[k - 1] : null;
  const uHi = util(hi);
  const uLo = lo ? util(lo) : Infinity;
  // Between the steps, log–log: force, contact radius and pressure go as powers of the travel
  // near a Hertz contact (F ∝ d^1.5, a ∝ d^0.5), so the utilisation does too. The first step from
  // zero travel is taken whole.
  const logs = lo && Number.isFinite(uLo) && (lo.travel_per_pad_mm ?? 0) > 0;
  const w = logs ? Math.log(uLo) / Math.log(uLo / uHi) : 1;
  const mix = (x: number | null, y: number | null) =>
    x === null || y === null || !(x > 0) || !(y > 0)
      ? y
      : Math.exp(Math.log(x) + (Math.log(y) - Math.log(x)) * w);
  const peak = mix(lo?.peak_pressure_kpa ?? null, hi.peak_pressure_kpa);
  return {
    travel_per_pad_mm: r4(mix(lo?.travel_per_pad_mm ?? null, hi.travel_per_pad_mm)!),
    force_n: r4(mix(lo?.force_n ?? null, hi.force_n)!),
    peak_pressure_kpa: peak === null ? null : r4(peak),
    bruise_margin:
      a.thresholdKpa === null || peak === null || !(peak > 0)
        ? null
        : Number((a.thresholdKpa / peak).toPrecision(3)),
    reason: null,
  };
}

/** Plain words where the twist changes what the engineer should do. */
export function twistWarnings(t: ReturnType<typeof twistJson>): Text[] {
  if (t.offset_mm === 0 || t.holds_at_grip) return [];
  const h = t.holding;
  const fix = h?.travel_per_pad_mm
    ? ph` Closing to ${m(h.travel_per_pad_mm, 'mm')} per pad holds both${h.bruise_margin === null ? '' : ` (bruise margin ${h.bruise_margin})`}; or grip nearer the centre of mass.`
    : h?.reason
      ? ` ${h.reason[0].toUpperCase()}${h.reason.slice(1)}.`
      : '';
  return [
    ph`Gripped ${m(t.offset_mm, 'mm')} off the centre of mass, the fruit turns about the pad axis: the twist uses ${Math.round((t.twist_utilisation ?? 0) * 100)} % of the pads' torsional friction with the safety factor, and with the lift load the grip holds only ${Math.round(100 / (t.combined_utilisation ?? Infinity))} % of what it must.${fix}`,
  ];
}
