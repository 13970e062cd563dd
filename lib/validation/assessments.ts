import { z } from 'zod';
import { CHECK_NAMES_LIST } from './check-names';

export const assessmentSchema = z
  .object({
    check: z.enum(CHECK_NAMES_LIST, {
      error: `check must be one of ${CHECK_NAMES_LIST.join(', ')}.`,
    }),
    title: z
      .string({ error: 'Give the assessment a title.' })
      .trim()
      .min(1, 'Give the assessment a title.')
      .max(200, 'At most 200 characters.'),
    notes: z.string().trim().max(5000, 'At most 5000 characters.').optional(),
    inputs: z.record(z.string(), z.unknown(), {
      error: 'inputs must be the check’s input object.',
    }),
  })
  .strict();

export const assessmentListSchema = z.object({
  check: z.enum(CHECK_NAMES_LIST).optional(),
  cultivar: z.string().max(80).optional(),
});
