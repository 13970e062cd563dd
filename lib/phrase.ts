import { z } from 'zod';
import { formatMeasure, type UnitSystem } from './units';

/**
 * Sentences the server writes about figures (a bruise's size, the travel to close to, a stored
 * mass), kept as words and measures so each reader sees the measures in their own units — on the
 * page, in a saved report, its PDF and CSV — whenever and by whomever it is read. A measure is in
 * its SI unit; plain strings (older results) pass through.
 */
export interface Measure {
  value: number;
  unit: string;
}
export type Phrase = (string | Measure)[];
export type Text = string | Phrase;

export const measureSchema = z.object({ value: z.number(), unit: z.string() });
export const phraseSchema = z.array(z.union([z.string(), measureSchema]));
/** A sentence as results store it: a phrase, or a plain string (results saved before phrases). */
export const textSchema = z.union([z.string(), phraseSchema]);

/** A measure in SI. */
export const m = (value: number, unit: string): Measure => ({ value, unit });

/**
 * A phrase from a template: `ph\`close to ${m(0.43, 'mm')} per pad\``. Numbers and strings
 * interpolated are words; measures stay measures; a phrase interpolated is spliced in.
 */
export function ph(
  strings: TemplateStringsArray,
  ...parts: (string | number | Measure | Phrase)[]
) {
  const out: Phrase = [];
  const push = (x: string | Measure) => {
    if (typeof x === 'string') {
      if (x === '') return;
      const last = out[out.length - 1];
      if (typeof last === 'string') out[out.length - 1] = last + x;
      else out.push(x);
    } else out.push(x);
  };
  strings.forEach((s, i) => {
    push(s);
    if (i < parts.length) {
      const p = parts[i];
      if (Array.isArray(p)) p.forEach(push);
      else push(typeof p === 'number' ? String(p) : p);
    }
  });
  return out;
}

/** The sentence in a reader's units (four significant figures for each measure). */
export function textIn(t: Text, system: UnitSystem): string {
  if (typeof t === 'string') return t;
  return t
    .map((p) => (typeof p === 'string' ? p : formatMeasure(p.value, p.unit, system)))
    .join('');
}

/** The sentence in SI, for logs, tests and the audit trail. */
export const siText = (t: Text) => textIn(t, 'si');
