import { z } from 'zod';
import { DROP_SURFACE_KEYS } from '@/lib/checks/surfaces';
import { slugSchema } from './cultivars';

/** A number in a stated range; `unit` goes into the message so the user sees what is meant. */
export const measure = (label: string, unit: string, min: number, max: number, open = true) =>
  z
    .number({ error: `${label} must be a number (${unit}).` })
    .refine(Number.isFinite, `${label} must be a finite number.`)
    .refine((v) => (open ? v > min : v >= min), `${label} must be above ${min} ${unit}.`)
    .refine((v) => v <= max, `${label} must be at most ${max} ${unit}.`);

const poisson = z
  .number({ error: "Poisson's ratio must be a number." })
  .refine(
    (v) => Number.isFinite(v) && v >= 0 && v < 0.5,
    "Poisson's ratio must be from 0 up to (not including) 0.5.",
  );

/** The fruit, from a cultivar's published values and/or the user's own figures. */
export const fruitSchema = {
  cultivar: slugSchema.optional(),
  modulusMpa: measure("Young's modulus", 'MPa', 0, 1000).optional(),
  poisson: poisson.optional(),
  diameterMm: measure('Diameter', 'mm', 0, 500).optional(),
  massG: measure('Mass', 'g', 0, 20_000).optional(),
  staticThresholdKpa: measure('Static bruise threshold', 'kPa', 0, 100_000).optional(),
};

export const dropCheckSchema = z
  .object({
    ...fruitSchema,
    heightMm: measure('Drop height', 'mm', 0, 10_000),
    surface: z.enum(DROP_SURFACE_KEYS, {
      error: `Surface must be one of ${DROP_SURFACE_KEYS.join(', ')}.`,
    }),
    padModulusMpa: measure('Padding modulus', 'MPa', 0, 10_000).optional(),
    padThicknessMm: measure('Padding thickness', 'mm', 0, 1000).optional(),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.surface === 'foam' && v.padModulusMpa === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['padModulusMpa'],
        message: 'Give the padding modulus (MPa).',
      });
    }
    if (v.surface === 'foam' && v.padThicknessMm === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['padThicknessMm'],
        message: 'Give the padding thickness (mm).',
      });
    }
  });

export type DropCheckInput = z.infer<typeof dropCheckSchema>;

export const stackCheckSchema = z
  .object({
    ...fruitSchema,
    binLengthMm: measure('Bin length', 'mm', 0, 20_000),
    binWidthMm: measure('Bin width', 'mm', 0, 20_000),
    fillDepthMm: measure('Fill depth', 'mm', 0, 20_000),
    bulkDensityKgM3: measure('Bulk density', 'kg/m³', 0, 3000).optional(),
    wallFriction: measure('Wall friction coefficient', '', 0, 2).optional(),
    lateralRatio: measure('Lateral pressure ratio', '', 0, 1).optional(),
  })
  .strict();

export type StackCheckInput = z.infer<typeof stackCheckSchema>;
