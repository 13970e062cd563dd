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
    horizontal_acceleration_m_s2: input.horizontalAccelerationMs2,
    grip_offset_mm: input.gripOffsetMm,
    max_travel_mm: r.maxTravelMm,
    max_travel_auto: r.maxTravelAuto,
  };
  // The hold's figures: they move the grip over time, not the bruise margin at t = 0, so the
  // verdict's evidence is named without them.
  const holdUsed = {
    hold_time_s: input.holdSeconds ?? null,
    relaxation_k1_s: r.relaxation?.k1 ?? null,
    relaxation_k2: r.relaxation?.k2 ?? null,
  };
  return {
    pinned: pinnedSummary(r.fruit.pinned),
    inputs_used: { ...inputsUsed, ...holdUsed },
    evidence: verdictEvidence(inputsUsed),
  };
}

export type SqueezeHead = ReturnType<typeof squeezeHead>;
