import { z } from 'zod';
import { RUNGS, restsOn, weakestRung, type Rung } from '@/lib/evidence/rungs';
import type { UsedValue } from './used-value';

/** The words a result's figures are named by where the verdict says what it rests on. */
const NAMES: Record<string, string> = {
  modulus_mpa: "Young's modulus",
  poisson_ratio: "Poisson's ratio",
  diameter_mm: 'the size',
  axial_diameter_mm: 'the axial size',
  mass_g: 'the mass',
  density_kg_m3: 'the density',
  static_bruise_threshold_kpa: 'the bruise threshold',
  friction: 'the friction',
  failure_stress_kpa: 'the failure stress',
  bulk_density_kg_m3: 'the bulk density',
  wall_friction: 'the wall friction',
  lateral_pressure_ratio: 'the lateral pressure ratio',
  dynamic_threshold: 'the drop threshold',
};

export const evidenceSummarySchema = z.object({
  weakest_rung: z.enum(RUNGS).nullable(),
  rests_on: z.string(),
});

export type EvidenceSummary = z.infer<typeof evidenceSummarySchema>;

const isUsed = (v: unknown): v is UsedValue =>
  typeof v === 'object' && v !== null && 'rung' in v && 'value' in v;

/**
 * The weakest rung among the figures a verdict rests on, and the sentence that names it
 * ("rests on a commodity value for the bruise threshold and the friction").
 */
export function verdictEvidence(
  used: Record<string, unknown>,
  extra: [string, Rung][] = [],
): EvidenceSummary {
  const figures: [string, Rung][] = [
    ...Object.entries(used).flatMap(([key, v]): [string, Rung][] =>
      isUsed(v) ? [[key, v.rung]] : [],
    ),
    ...extra,
  ];
  const weakest = weakestRung(figures.map(([, r]) => r));
  const which = figures.filter(([, r]) => r === weakest).map(([k]) => NAMES[k] ?? k);
  return { weakest_rung: weakest, rests_on: `The verdict ${restsOn(weakest, which)}.` };
}
