import { z } from 'zod';
import type { SampleGeometry } from './fit';

const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);

const length = (label: string, max: number) =>
  z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: `${label} must be a number in mm.` })
      .refine(Number.isFinite, `${label} must be a number in mm.`)
      .refine((v) => v > 0 && v <= max, `${label} must be above 0 and at most ${max} mm.`)
      .optional(),
  );

/**
 * The fields sent with a lab-test file. Poisson's ratio lies strictly between 0 and 0.5: the
 * numerical core's fit refuses both ends (0.5 is incompressible).
 */
export const labTestUploadSchema = z
  .object({
    diameterMm: length('The diameter', 500),
    radius1Mm: length('The first radius', 5000),
    radius2Mm: length('The second radius', 5000),
    poisson: z.preprocess(
      blankToUndefined,
      z.coerce
        .number({ error: "Give Poisson's ratio, a number between 0 and 0.5." })
        .refine(Number.isFinite, "Poisson's ratio must be a number between 0 and 0.5.")
        .refine((v) => v > 0 && v < 0.5, "Poisson's ratio must be above 0 and below 0.5."),
    ),
  })
  .superRefine((v, ctx) => {
    const radii = [v.radius1Mm, v.radius2Mm].filter((r) => r !== undefined).length;
    const issue = (path: string, message: string) =>
      ctx.addIssue({ code: 'custom', path: [path], message });
    if (v.diameterMm !== undefined && radii > 0) {
      issue('diameterMm', 'Give the diameter or the two radii, not both.');
    } else if (v.diameterMm === undefined && radii === 0) {
      issue('diameterMm', "Give the sample's diameter in mm (or its two radii of curvature).");
    } else if (radii === 1) {
      issue(v.radius1Mm === undefined ? 'radius1Mm' : 'radius2Mm', 'Give both radii of curvature.');
    }
  });

export type LabTestUploadInput = z.infer<typeof labTestUploadSchema>;

export function geometryOf(input: LabTestUploadInput): SampleGeometry {
  if (input.diameterMm !== undefined) return { kind: 'sphere', diameterMm: input.diameterMm };
  return { kind: 'radii', radiiMm: [input.radius1Mm!, input.radius2Mm!] };
}
