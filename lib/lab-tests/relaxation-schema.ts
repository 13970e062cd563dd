import { z } from 'zod';

/** What was held between the plates; the draft's values carry it as their probe. */
export const RELAXATION_SPECIMENS = [
  'whole fruit between flat plates',
  'flesh cylinder between flat plates',
] as const;
export type RelaxationSpecimen = (typeof RELAXATION_SPECIMENS)[number];

/** The held plate travel is at most this, mm: more than any fruit's diameter could take. */
export const MAX_DEFORMATION_MM = 100;
/** Test temperatures accepted, °C: cold store (just below 0) to a hot packhouse. */
export const TEMPERATURE_RANGE_C = [-5, 50] as const;

const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);
const [lowC, highC] = TEMPERATURE_RANGE_C;

/** The fields sent with a relaxation-test file. */
export const relaxationUploadSchema = z.object({
  deformationMm: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: 'Give the held plate travel, a number in mm.' })
      .refine(Number.isFinite, 'The held plate travel must be a number in mm.')
      .refine(
        (v) => v > 0 && v <= MAX_DEFORMATION_MM,
        `The held plate travel must be above 0 and at most ${MAX_DEFORMATION_MM} mm.`,
      ),
  ),
  specimen: z.enum(RELAXATION_SPECIMENS, {
    error: 'Choose the specimen: a whole fruit or a flesh cylinder between flat plates.',
  }),
  loadingRate: z.preprocess(
    blankToUndefined,
    z.string().trim().max(60, 'The loading rate is at most 60 characters.').optional(),
  ),
  temperatureC: z.preprocess(
    blankToUndefined,
    z.coerce
      .number({ error: 'The temperature must be a number in °C.' })
      .refine(Number.isFinite, 'The temperature must be a number in °C.')
      .refine(
        (v) => v >= lowC && v <= highC,
        `The temperature must be from ${lowC} to ${highC} °C.`,
      )
      .optional(),
  ),
});

export type RelaxationUploadInput = z.infer<typeof relaxationUploadSchema>;
