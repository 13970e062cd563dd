import { z } from 'zod';

/** How a figure a check used was found: the rungs of the evidence it rests on. */
export const USED_ORIGINS = ['published', 'derived', 'entered', 'typical default'] as const;

export const usedValueSchema = z.object({
  value: z.number(),
  unit: z.string(),
  origin: z.enum(USED_ORIGINS),
  /** Citation of the value's source, or how it was worked out. */
  source: z.string().nullable(),
  low: z.number().nullable(),
  high: z.number().nullable(),
  sd: z.number().nullable(),
});

/** A property a check used, with where it came from. */
export type UsedValue = z.infer<typeof usedValueSchema>;

export const pinnedSchema = z
  .object({
    cultivar: z.string(),
    name: z.string(),
    commodity: z.string(),
    revision_id: z.number(),
    revision_number: z.number(),
  })
  .nullable();

export type PinnedSummary = z.infer<typeof pinnedSchema>;

export const verdictSchema = z.enum(['comfortable', 'tight', 'bruise risk']);

/** The fruit's figures every check uses, as its result names them. */
export const fruitUsedShape = {
  modulus_mpa: usedValueSchema,
  poisson_ratio: usedValueSchema,
  diameter_mm: usedValueSchema,
  mass_g: usedValueSchema,
  static_bruise_threshold_kpa: usedValueSchema.nullable(),
};
