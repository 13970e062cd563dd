import type { z } from 'zod';
import { ValidationError, type FieldErrors } from '@/lib/errors';

/** zod issues → { field: [messages] }; issues without a path go under "_form". */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_form';
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** Parse or throw a ValidationError carrying field messages. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.infer<S> {
  const result = schema.safeParse(input);
  if (!result.success) {
    throw new ValidationError('Some fields are not valid.', fieldErrorsOf(result.error));
  }
  return result.data;
}
