import { z } from 'zod';
import { slugSchema } from '@/lib/validation/cultivars';

export const GRADE_MEASURES = ['diameter', 'area'] as const;
export type GradeMeasure = (typeof GRADE_MEASURES)[number];
export const GRADE_KINDS = ['standard', 'research', 'site'] as const;
export type GradeKind = (typeof GRADE_KINDS)[number];

const positive = (label: string, unit: string, max: number) =>
  z
    .number({ error: `${label} must be a number (${unit}).` })
    .refine(Number.isFinite, `${label} must be a finite number.`)
    .refine((v) => v > 0, `${label} must be above 0 ${unit}.`)
    .refine((v) => v <= max, `${label} must be at most ${max} ${unit}.`);

/** A site's own grade rule, as an admin enters it (SI: mm, mm²). */
export const gradeRuleInputSchema = z
  .object({
    name: z
      .string({ error: 'Name the rule.' })
      .trim()
      .min(3, 'Name the rule (at least 3 characters).')
      .max(160, 'At most 160 characters.'),
    commodity: slugSchema.nullable().default(null),
    measure: z.enum(GRADE_MEASURES, { error: 'Choose diameter or area.' }),
    limit: positive('The largest bruise tolerated', 'mm or mm²', 100_000),
    maxDepthMm: positive('The largest depth tolerated', 'mm', 200).nullable().default(null),
    note: z.string().trim().max(1000, 'At most 1000 characters.').nullable().default(null),
  })
  .strict();

export type GradeRuleInput = z.infer<typeof gradeRuleInputSchema>;
