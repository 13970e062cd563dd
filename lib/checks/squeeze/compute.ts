/**
 * The squeeze check's model work, pure and run in a worker thread: the squeeze with its grip
 * point, the pad sweep, the slip map at the grip, and the Monte Carlo probability of bruising.
 */
import {
  fruitMass,
  runCase,
  runMonteCarlo,
  slipMapOfRun,
  squeezeResultJson,
  squeezeResultOf,
  sweepPadDiameters,
  type GripSlipMap,
  type SqueezeInput,
  type Spreads,
} from '@/fem';
import type { Text } from '@/lib/phrase';
import { verdictOf } from '../verdict';
import type { SqueezeHead } from './head';
import { holdJson, holdWarnings, type HoldInput } from './hold';
import { twistJson, twistWarnings, type MoveInput } from './twist';
import { squeezeResultSchema, type SqueezeResult } from './result';

const r4 = (v: number | null | undefined) =>
  v == null || !Number.isFinite(v) ? null : Number(v.toPrecision(4));
const mm = (m: number | null | undefined) => r4(m == null ? null : m * 1e3);
const kpa = (pa: number | null | undefined) => r4(pa == null ? null : pa / 1e3);

export interface SqueezeTaskInput {
  input: SqueezeInput;
  /** pad diameters of the sweep, m; null for none */
  sweep: number[] | null;
  /** the hold after the grip closes; null or absent for the grip at t = 0 only */
  hold?: HoldInput | null;
  /** the move's accelerations and the grip's offset; absent: straight up, on the centre */
  move?: MoveInput | null;
}

function sweepJson(input: SqueezeInput, diameters: number[]) {
  const points = sweepPadDiameters(input, diameters).map((p) => ({
    pad_diameter_mm: mm(p.padDiameter),
    bruise_margin: p.bruiseMargin === null ? null : Number(p.bruiseMargin.toPrecision(3)),
    grip_force_n: r4(p.gripForce),
    grip_peak_pressure_kpa: kpa(p.gripPeakPressure),
    reason: p.reason,
  }));
  const safe = points.find((p) => p.bruise_margin !== null && p.bruise_margin >= 1);
  return { points, smallest_safe_pad_mm: safe?.pad_diameter_mm ?? null };
}

function slipJson(s: GripSlipMap) {
  if (!s.map) return { holds: null, reason: s.reason };
  const m = s.map;
  return {
    holds: !m.grossSliding,
    reason: s.reason,
    lift_load_n: r4(s.liftLoad),
    design_load_n: r4(s.designLoad),
    utilisation: r4(m.utilisation),
    contact_radius_mm: mm(m.contactRadius),
    stick_radius_mm: mm(m.stickRadius),
    slip_annulus_mm: { inner: mm(m.slipAnnulus.inner), outer: mm(m.slipAnnulus.outer) },
    nodes: m.nodes.map((n) => ({
      r_mm: mm(n.r),
      state: n.state,
      traction_kpa: kpa(n.traction),
      pressure_kpa: kpa(n.pressure),
    })),
  };
}

export function squeezeTask({ input, sweep, hold, move }: SqueezeTaskInput) {
  // One run serves the result and the slip map at its grip.
  const run = runCase(input, true);
  const result = squeezeResultOf(run);
  const grip = result.liftability?.grip ?? null;
  return {
    model: squeezeResultJson(result),
    grip_profile: grip
      ? grip.profile.map((p) => ({ r_mm: mm(p.r), pressure_kpa: kpa(p.pressure) }))
      : null,
    sweep: sweep && grip ? sweepJson(input, sweep) : null,
    slip: grip ? slipJson(slipMapOfRun(run)) : null,
    hold: hold ? holdJson(input, hold, grip?.force ?? null) : null,
    twist: move && grip ? twistOf(input, move, grip, result.steps) : null,
  };
}

function twistOf(
  input: SqueezeInput,
  move: MoveInput,
  grip: NonNullable<NonNullable<ReturnType<typeof squeezeResultOf>['liftability']>['grip']>,
  steps: ReturnType<typeof squeezeResultOf>['steps'],
) {
  const axial = input.axialRadius ?? input.equatorialRadius;
  return twistJson({
    move,
    massKg: fruitMass('axisymmetric', input.equatorialRadius, axial, input.density ?? 0),
    friction: input.friction ?? 0,
    safetyFactor: input.safetyFactor ?? 1,
    grip: {
      force_n: grip.force,
      contact_radius_mm: grip.contactRadius * 1e3,
      profile: grip.profile.map((p) => ({ r_mm: p.r * 1e3, pressure_kpa: p.pressure / 1e3 })),
    },
    steps: steps.map((s) => ({
      travel_per_pad_mm: s.travel * 1e3,
      force_n: s.force,
      contact_radius_mm: s.contactRadius * 1e3,
      peak_pressure_kpa: s.peakPressure / 1e3,
    })),
    thresholdKpa: input.bruiseThreshold === undefined ? null : input.bruiseThreshold / 1e3,
  });
}

export type SqueezeTaskResult = ReturnType<typeof squeezeTask>;

export interface SqueezeCheckTaskInput extends SqueezeTaskInput {
  /** the figures the main thread resolved (pinned revision, inputs used), placed first */
  head: SqueezeHead;
  /** warnings of the inputs, after the model's own */
  inputWarnings: Text[];
}

/**
 * The whole squeeze check answer, built in the worker from the model run and the head, and
 * checked against its schema there (off the main thread), so what leaves the worker is typed.
 */
export function squeezeCheckTask({
  head,
  inputWarnings,
  ...task
}: SqueezeCheckTaskInput): SqueezeResult {
  const out = squeezeTask(task);
  const margin = out.model.liftability?.grip?.bruise_margin ?? null;
  return squeezeResultSchema.parse({
    check: 'squeeze' as const,
    ...head,
    margin:
      margin === null
        ? null
        : { value: margin, basis: 'static' as const, verdict: verdictOf(margin) },
    ...out,
    warnings: [
      ...out.model.warnings.map((w) => w.message),
      ...inputWarnings,
      ...(out.hold ? holdWarnings(out.hold) : []),
      ...(out.twist ? twistWarnings(out.twist) : []),
    ],
  });
}

export interface ProbabilityTaskInput {
  base: SqueezeInput;
  spreads: Spreads;
  samples: number;
  seed: number;
}

export function probabilityTask(input: ProbabilityTaskInput, progress: (f: number) => void) {
  return runMonteCarlo(input, { onProgress: progress });
}
