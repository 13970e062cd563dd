import { z } from 'zod';
import { parseInput } from './parse';

/**
 * A record id as it appears in a path or a form: plain decimal digits, no sign, no leading zero,
 * no spaces, hex or exponent (`0x1`, `%201`, `00005`, `1e3` are refused), at most 15 digits.
 */
export const idSchema = z
  .string({ error: 'Must be a positive whole number.' })
  .regex(/^[1-9][0-9]{0,14}$/, 'Must be a positive whole number written in plain digits.')
  .transform(Number);

/** Parse a positive integer id from a route segment or form field, or throw a 400. */
export function parseId(value: unknown, field = 'id'): number {
  return parseInput(z.object({ [field]: idSchema }), { [field]: value })[field] as number;
}
