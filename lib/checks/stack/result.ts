import { z } from 'zod';
import { textSchema } from '@/lib/phrase';
import { bruiseSchema } from '../bruise';
import { evidenceSummarySchema } from '../evidence-summary';
import { fruitUsedShape, pinnedSchema, usedValueSchema, verdictSchema } from '../used-value';

const n = z.number();

/** The stack check's result as it is answered and saved (schema `stack/2`: every used figure with its rung; `stack/1` results are read through the same schema). */
export const stackResultSchema = z.object({
  check: z.literal('stack'),
  pinned: pinnedSchema,
  inputs_used: z.object({
    ...fruitUsedShape,
    bulk_density_kg_m3: usedValueSchema,
    wall_friction: usedValueSchema,
    lateral_pressure_ratio: usedValueSchema,
    fill_depth_mm: n,
    bin_length_mm: n,
    bin_width_mm: n,
  }),
  bottom: z.object({
    vertical_pressure_kpa: n,
    contact_force_n: n,
    contact_radius_mm: n,
    contact_pressure_kpa: n,
  }),
  margin: z.object({ value: n, basis: z.literal('static'), verdict: verdictSchema }).nullable(),
  /** mm; null: any depth is safe; absent: no threshold to judge by. */
  deepest_safe_fill_mm: n.nullable().optional(),
  /** The bruise at the bottom contact against the chosen grade rule (absent: no threshold). */
  bruise: bruiseSchema.nullable().optional(),
  /** Deepest fill whose bottom bruise stays within the rule, mm; null: any depth. */
  deepest_fill_within_tolerance_mm: n.nullable().optional(),
  /** The two fills as whole layers of fruit (fill ÷ fruit diameter, a simple cubic stack). */
  layers: z
    .object({
      no_bruise: n.nullable().optional(),
      within_tolerance: n.nullable().optional(),
      fruit_diameter_mm: n,
    })
    .optional(),
  series: z.array(
    z.object({
      depth_mm: n,
      vertical_pressure_kpa: n,
      contact_pressure_kpa: n,
      margin: n.nullable(),
    }),
  ),
  /** Sentences, their measures shown in the reader's units (strings in older results). */
  warnings: z.array(textSchema),
  /** The weakest rung of evidence the verdict rests on (absent in results saved before it). */
  evidence: evidenceSummarySchema.optional(),
  units: z.record(z.string(), z.string()),
});

export type StackResult = z.infer<typeof stackResultSchema>;
