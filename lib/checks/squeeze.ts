import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { runTask } from '@/lib/compute/pool';
import type { SqueezeTaskResult } from '@/lib/compute/squeeze-task';
import { parseInput } from '@/lib/validation/parse';
import { squeezeCheckSchema } from '@/lib/validation/checks';
import { FACING_PRESETS } from './facings';
import { resolveSqueeze, sweepDiameters } from './squeeze-inputs';
import { verdictOf } from './verdict';

/**
 * The squeeze check: two opposed pads grip the fruit; the finite-element squeeze (in a worker
 * thread) finds the travel at which the grip lifts it, and the bruise margin there.
 */
export async function runSqueezeCheck(actor: Actor, raw: unknown) {
  const input = parseInput(squeezeCheckSchema, raw);
  const r = await resolveSqueeze(actor, input);
  const out = await runTask<SqueezeTaskResult>('squeeze', {
    input: r.model,
    sweep: input.sweep ? sweepDiameters(input, r.fruit.diameterMm.value) : null,
  });
  const grip = out.model.liftability?.grip ?? null;
  const margin = grip?.bruise_margin ?? null;
  const p = r.fruit.pinned;
  return {
    check: 'squeeze' as const,
    pinned: p && {
      cultivar: p.slug,
      name: p.name,
      commodity: p.commodity,
      revision_id: p.revisionId,
      revision_number: p.revisionNumber,
    },
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
    margin: margin === null ? null : { value: margin, basis: 'static', verdict: verdictOf(margin) },
    ...out,
    warnings: [
      ...out.model.warnings.map((w) => w.message),
      ...(r.fruit.staticThresholdKpa
        ? []
        : ['No static bruise threshold: enter one to get a bruise margin.']),
    ],
  };
}

export type SqueezeCheckResult = Awaited<ReturnType<typeof runSqueezeCheck>>;
