import { z } from 'zod';
import { pinnedSchema, usedValueSchema, verdictSchema } from '@/lib/checks/used-value';

// A trivial fourth check, as a newcomer would write it: a fruit rolling down a chute of given
// length at a steady speed. Illustrative only; nothing here is a model of the trade.
export const rollResultSchema = z.object({
  check: z.literal('roll'),
  pinned: pinnedSchema,
  inputs_used: z.object({ mass_g: usedValueSchema, chute_length_mm: z.number() }),
  speed_m_s: z.number(),
  margin: z.object({ value: z.number(), basis: z.string(), verdict: verdictSchema }).nullable(),
  series: z.array(z.object({ length_mm: z.number(), speed_m_s: z.number() })),
  warnings: z.array(z.string()),
});

export type RollResult = z.infer<typeof rollResultSchema>;
