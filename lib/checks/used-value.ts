import { z } from 'zod';
import { STAGES } from '@/lib/properties/quantities';
import { usedValueSchema } from '@/lib/evidence/used';

export { usedValueSchema, enteredValue, type UsedValue } from '@/lib/evidence/used';

const pinnedRecordSchema = z.object({
  cultivar: z.string(),
  revision_id: z.number(),
  revision_number: z.number(),
});

/** The revisions a result drew on: the cultivar's, and its commodity record's where it inherited. */
export const pinnedSchema = z
  .object({
    cultivar: z.string(),
    name: z.string(),
    commodity: z.string(),
    revision_id: z.number(),
    revision_number: z.number(),
    // Results saved before the evidence ladder pinned only the cultivar's own revision.
    commodity_record: pinnedRecordSchema.nullable().default(null),
    stage: z.enum(STAGES).nullable().default(null),
  })
  .nullable();

export type PinnedSummary = z.infer<typeof pinnedSchema>;

export const verdictSchema = z.enum(['comfortable', 'tight', 'bruise risk']);

/** An axial diameter saved before rungs were kept was a bare number of millimetres. */
const legacyAxial = z.preprocess(
  (raw) =>
    typeof raw === 'number'
      ? {
          value: raw,
          unit: 'mm',
          rung: 'entered',
          source: null,
          note: 'Saved before the evidence ladder: where it came from was not kept.',
          low: null,
          high: null,
          sd: null,
          spread: null,
        }
      : raw,
  usedValueSchema,
);

/** The fruit's figures every check uses, as its result names them. */
export const fruitUsedShape = {
  modulus_mpa: usedValueSchema,
  poisson_ratio: usedValueSchema,
  diameter_mm: usedValueSchema,
  axial_diameter_mm: legacyAxial.optional(),
  mass_g: usedValueSchema,
  density_kg_m3: usedValueSchema.optional(),
  static_bruise_threshold_kpa: usedValueSchema.nullable(),
};
