import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { runTask } from '@/lib/compute/pool';
import type { SqueezeTaskResult } from '@/lib/compute/squeeze-task';
import { parseInput } from '@/lib/validation/parse';
import { squeezeCheckSchema, type SqueezeCheckInput } from '@/lib/validation/checks';
import { pinnedSummary } from './cultivar-inputs';
import { FACING_PRESETS } from './facings';
import { resolveSqueeze, sweepDiameters, type ResolvedSqueeze } from './squeeze-inputs';
import type { Verdict } from './verdict';

/**
 * The squeeze check: two opposed pads grip the fruit; the finite-element squeeze (in a worker
 * thread) finds the travel at which the grip lifts it, and the bruise margin there. The answer
 * comes back from the worker as the JSON text of `{ result }` (see squeezeCheckTask).
 */
/** The figures resolved on the main thread that open the answer: the pinned revision, inputs used. */
function headOf(r: ResolvedSqueeze, input: SqueezeCheckInput) {
  return {
    pinned: pinnedSummary(r.fruit.pinned),
    inputs_used: {
      modulus_mpa: r.fruit.modulusMpa,
      poisson_ratio: r.fruit.poisson,
      diameter_mm: r.fruit.diameterMm,
      axial_diameter_mm: r.axialMm,
      mass_g: r.fruit.massG,
      density_kg_m3: r.density,
      friction: r.friction,
      static_bruise_threshold_kpa: r.fruit.staticThresholdKpa,
      failure_stress_kpa: r.failureStress,
      pad_diameter_mm: input.padDiameterMm ?? null,
      pad_edge_mm: input.padEdgeMm ?? null,
      facing: input.facing,
      facing_basis: FACING_PRESETS[input.facing].basis,
      safety_factor: input.safetyFactor,
      acceleration_m_s2: input.accelerationMs2,
      max_travel_mm: input.maxTravelMm,
    },
  };
}

export async function squeezeCheckJson(actor: Actor, raw: unknown): Promise<string> {
  const input = parseInput(squeezeCheckSchema, raw);
  const r = await resolveSqueeze(actor, input);
  const head = headOf(r, input);
  return runTask<string>('squeeze-check', {
    input: r.model,
    sweep: input.sweep ? sweepDiameters(input, r.fruit.diameterMm.value) : null,
    head,
    inputWarnings: r.fruit.staticThresholdKpa
      ? []
      : ['No static bruise threshold: enter one to get a bruise margin.'],
  });
}

export type SqueezeCheckResult = { check: 'squeeze' } & ReturnType<typeof headOf> & {
    margin: { value: number; basis: 'static'; verdict: Verdict } | null;
    warnings: string[];
  } & SqueezeTaskResult;

/** The squeeze check's result as an object (assessments, re-runs). */
export async function runSqueezeCheck(actor: Actor, raw: unknown): Promise<SqueezeCheckResult> {
  return (JSON.parse(await squeezeCheckJson(actor, raw)) as { result: SqueezeCheckResult }).result;
}
