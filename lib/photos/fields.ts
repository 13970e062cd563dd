import { z } from 'zod';
import { CAPTION_MAX, CREDIT_MAX } from './limits';

const optionalText = (max: number, label: string) =>
  z
    .string({ error: `${label} must be text.` })
    .trim()
    .max(max, `${label} is at most ${max} characters.`)
    .optional()
    .transform((v) => (v ? v : null));

/** The text fields of an upload form; the file is checked from its bytes, elsewhere. */
export const photoFieldsSchema = z.object({
  caption: optionalText(CAPTION_MAX, 'The caption'),
  credit: optionalText(CREDIT_MAX, 'The credit'),
  // Demo photos are made by the demo seed alone; an upload cannot claim to be one.
  demo: z.never({ error: 'Only the demo seed marks a photo as a demo photo.' }).optional(),
});

export type PhotoFields = z.infer<typeof photoFieldsSchema>;

/**
 * Why a file name is refused, or null. The name is never stored or used for a key; a name with
 * folders in it only comes from a hand-made request, so it is refused rather than guessed at.
 */
export function fileNameProblem(name: string): string | null {
  const control = [...name].some((c) => c.charCodeAt(0) < 0x20 || c.charCodeAt(0) === 0x7f);
  if (/[\\/]/.test(name) || name === '.' || name === '..' || control) {
    return 'The file name looks like a path; send the file under a plain name such as photo.jpg.';
  }
  if (name.length > 255) return 'The file name is longer than 255 characters.';
  return null;
}
