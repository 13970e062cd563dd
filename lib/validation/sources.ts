import { z } from 'zod';
import { SOURCE_KINDS } from '@/lib/properties/quantities';

const optionalText = (max: number) =>
  z.preprocess(
    (v) => (typeof v === 'string' && v.trim() === '' ? null : v),
    z.string().trim().max(max, `At most ${max} characters.`).nullable().default(null),
  );

/** Kinds an editor may cite; demo sources come only from the demo seed. */
export const EDITOR_SOURCE_KINDS = SOURCE_KINDS.filter((k) => k !== 'demo');

/**
 * A new source an editor adds from the draft page: a citation key the values refer to, what
 * kind of work it is, and enough to find it again (authors, year, title, and where it appeared).
 */
export const sourceSchema = z.object({
  key: z
    .string({ error: 'Give the source a key.' })
    .trim()
    .regex(
      /^[a-z0-9]+(?:-[a-z0-9]+)*$/,
      'Use lower-case letters, digits and dashes, e.g. smith-2024-pear-bruising.',
    )
    .min(3, 'At least 3 characters.')
    .max(80, 'At most 80 characters.'),
  kind: z.enum(EDITOR_SOURCE_KINDS as [string, ...string[]], {
    error: 'Choose what kind of work it is.',
  }),
  authors: optionalText(500),
  year: z.preprocess(
    (v) => (v === '' || v === undefined || v === null ? null : v),
    z.coerce
      .number({ error: 'The year must be a number.' })
      .int('The year must be a whole number.')
      .min(1800, 'The year must be 1800 or later.')
      .max(new Date().getUTCFullYear() + 1, 'The year cannot be in the future.')
      .nullable(),
  ),
  title: z
    .string({ error: 'Give the title.' })
    .trim()
    .min(3, 'Give the title (at least 3 characters).')
    .max(500, 'At most 500 characters.'),
  venue: optionalText(300),
  pages: optionalText(40),
  doi: optionalText(200).refine(
    (v) => v === null || /^(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:)?10\.\d{4,9}\/\S+$/i.test(v),
    'A DOI starts with 10. and a registrant number, e.g. 10.1016/j.postharvbio.2020.111234.',
  ),
  url: optionalText(500).refine(
    (v) => v === null || /^https?:\/\/\S+$/i.test(v),
    'Give an address starting with http:// or https://.',
  ),
  note: optionalText(1000),
});

export type SourceInput = z.infer<typeof sourceSchema>;
