import { z } from 'zod';

export const slugSchema = z
  .string()
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Must be a slug: lower-case letters, digits and dashes.')
  .max(80, 'At most 80 characters.');

/** `GET /api/cultivars` filters; unknown parameters are ignored. */
export const cultivarQuerySchema = z.object({
  commodity: slugSchema.optional(),
  q: z.string().trim().max(100, 'The search text is at most 100 characters.').optional(),
  format: z.enum(['json', 'csv'], { error: 'format is json or csv.' }).optional(),
});

export const followSchema = z.object({
  follow: z.boolean({ error: 'follow must be true or false.' }),
});
