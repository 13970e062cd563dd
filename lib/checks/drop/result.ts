import { z } from 'zod';
import { textSchema } from '@/lib/phrase';
import { evidenceSummarySchema } from '../evidence-summary';
import { RUNGS } from '@/lib/evidence/rungs';
import { OBSERVATIONS } from '@/lib/properties/quantities';
import { bruiseSchema } from '../bruise';
import { fruitUsedShape, pinnedSchema, verdictSchema } from '../used-value';

const n = z.number();
const nn = z.number().nullable();

/** The drop check's result as it is answered and saved (schema `drop/2`: every used figure with its rung; `drop/1` results are read through the same schema). */
export const dropResultSchema = z.object({
  check: z.literal('drop'),
  pinned: pinnedSchema,
  inputs_used: z.object({
    ...fruitUsedShape,
    height_mm: n,
    surface: z.string(),
    surface_basis: z.string(),
  }),
  impact: z.object({
    impact_velocity_m_s: n,
    impact_energy_j: n,
    peak_force_n: n,
    contact_radius_mm: n,
    peak_pressure_kpa: n,
    contact_time_ms: n,
    max_approach_mm: n,
  }),
  margin: z
    .object({
      value: n,
      basis: z.enum(['dynamic', 'static']),
      verdict: verdictSchema,
      /** True when the margin is against a height at which fruit bruised (an upper bound). */
      upper_bound: z.boolean().default(false),
    })
    .nullable(),
  dynamic: z
    .object({
      safe_height_mm: n,
      margin: n,
      basis: textSchema,
      source: z.string().nullable(),
      note: z.string().nullable(),
      rung: z.enum(RUNGS).optional(),
      observation: z.enum(OBSERVATIONS).nullable().optional(),
      upper_bound: z.boolean().default(false),
    })
    .nullable(),
  static: z
    .object({
      margin: n,
      threshold_kpa: n,
      source: z.string().nullable(),
      rung: z.enum(RUNGS).optional(),
    })
    .nullable(),
  safe_heights: z.array(
    z.object({
      surface: z.string(),
      label: z.string(),
      dynamic_safe_height_mm: nn,
      dynamic_basis: textSchema.nullable(),
      dynamic_source: z.string().nullable(),
      dynamic_note: z.string().nullable(),
      dynamic_rung: z.enum(RUNGS).nullable().optional(),
      dynamic_upper_bound: z.boolean().nullable().optional(),
      static_safe_height_mm: nn,
      within_tolerance_height_mm: nn.optional(),
    }),
  ),
  /** The bruise the Hertz field predicts from the static threshold, against the grade rule. */
  bruise: bruiseSchema.nullable().optional(),
  /** The bruise from a published bruise susceptibility (volume per impact energy), where one exists. */
  bruise_volume: z
    .object({
      susceptibility_mm3_j: n,
      source: z.string().nullable(),
      rung: z.enum(RUNGS),
      impact_energy_j: n,
      volume_mm3: n,
      diameter_mm: n,
      within_tolerance_height_mm: nn,
      shape: z.string(),
    })
    .nullable()
    .optional(),
  /** Tallest drop onto this surface whose predicted bruise stays within the rule, mm. */
  within_tolerance_height_mm: nn.optional(),
  /** Which figure the verdict rests on, and how the published and predicted heights relate. */
  relation: textSchema.optional(),
  series: z.array(z.object({ height_mm: n, peak_pressure_kpa: n, impact_energy_j: n })),
  /** Sentences, their measures shown in the reader's units (strings in older results). */
  warnings: z.array(textSchema),
  /** The weakest rung of evidence the verdict rests on (absent in results saved before it). */
  evidence: evidenceSummarySchema.optional(),
  units: z.record(z.string(), z.string()),
});

export type DropResult = z.infer<typeof dropResultSchema>;
