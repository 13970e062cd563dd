import type { SqueezeCheckInput } from '@/lib/checks/inputs';
import { pinnedSummary } from '../cultivar-inputs';
import { verdictEvidence } from '../evidence-summary';
import { FACING_PRESETS } from '../facings';
import { fruitUsed } from '../resolve-fruit';
import type { ResolvedSqueeze } from './resolve';

/** The figures resolved on the main thread that open the answer: the pinned revision, inputs used. */
export function squeezeHead(r: ResolvedSqueeze, input: SqueezeCheckInput) {
  const inputsUsed = {
    ...fruitUsed(r.fruit),
    density_kg_m3: r.density,
    friction: r.friction,
    failure_stress_kpa: r.failureStress,
    pad_diameter_mm: input.padDiameterMm ?? null,
    pad_edge_mm: input.padEdgeMm ?? null,
    facing: input.facing,
    facing_basis: FACING_PRESETS[input.facing].basis,
    safety_factor: input.safetyFactor,
    acceleration_m_s2: input.accelerationMs2,
    max_travel_mm: input.maxTravelMm,
  };
  return {
    pinned: pinnedSummary(r.fruit.pinned),
    inputs_used: inputsUsed,
    evidence: verdictEvidence(inputsUsed),
  };
}

export type SqueezeHead = ReturnType<typeof squeezeHead>;
