import { z } from 'zod';

/**
 * FormData → a plain object of its string fields. Files are left to upload handlers, and React's
 * own `$ACTION_…` fields are not user input. The object has no prototype, so a field named
 * `__proto__` is just a field.
 */
export function formObject(form: FormData): Record<string, string> {
  const out: Record<string, string> = Object.create(null);
  for (const [key, value] of form.entries()) {
    if (typeof value === 'string' && !key.startsWith('$ACTION')) out[key] = value;
  }
  return out;
}

/** A checkbox or hidden field's 'true' / 'false' as a boolean; anything else stays invalid. */
export const formBoolean = z.preprocess(
  (v) => (v === 'true' ? true : v === 'false' ? false : v),
  z.boolean({ error: 'Must be true or false.' }),
);
