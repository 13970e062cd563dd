import { z } from 'zod';

/** An action as recorded: `area.verb`, lower case (`invitation.create`, `sign-in.failure`). */
const ACTION = /^[a-z][a-z-]{0,39}\.[a-z][a-z-]{0,39}$/;

const blank = (v: unknown) => (v === '' || v === null ? undefined : v);

/**
 * The audit log's filter, from the page's query or the API's: every part optional, an empty
 * field the same as none. Dates are whole days (UTC), both ends included.
 */
export const auditFilterSchema = z
  .object({
    action: z.preprocess(
      blank,
      z.string().regex(ACTION, { error: 'Choose an action from the list.' }).optional(),
    ),
    actor: z.preprocess(
      blank,
      z.coerce
        .number({ error: 'Choose a person from the list.' })
        .int({ error: 'Choose a person from the list.' })
        .positive({ error: 'Choose a person from the list.' })
        .optional(),
    ),
    from: z.preprocess(
      blank,
      z.iso.date({ error: 'Give the first day as 2026-12-01.' }).optional(),
    ),
    to: z.preprocess(blank, z.iso.date({ error: 'Give the last day as 2026-12-31.' }).optional()),
  })
  .refine((f) => !f.from || !f.to || f.from <= f.to, {
    path: ['to'],
    error: 'The last day is before the first day.',
  });

export type AuditFilter = z.infer<typeof auditFilterSchema>;
