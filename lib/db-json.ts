import { z } from 'zod';

/**
 * A JSON document stored in a text column, read through a zod schema: text that is not JSON,
 * or JSON of the wrong shape, fails here with the column's name instead of somewhere later.
 */
export function jsonText<T extends z.ZodType>(column: string, schema: T) {
  return z
    .string()
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: `${column} is not JSON` });
        return z.NEVER;
      }
    })
    .pipe(schema);
}

/** A JSON object whose fields are checked by whoever uses them. */
const jsonObject = z.record(z.string(), z.unknown());

/** `assessments.inputs`: the check's inputs; each check's input schema reads them. */
export const assessmentInputs = jsonText('assessments.inputs', jsonObject);

/** `assessments.results`: as computed then; the checks' result schemas read the inside. */
export const assessmentResults = jsonText('assessments.results', jsonObject);

/** `audit_log.detail`: what a write recorded about itself (lib/audit-trail.ts), or null. */
export const auditDetail = jsonText('audit_log.detail', jsonObject).nullable();
