import { z } from 'zod';
import { MESH_LEVELS, RENAMED_MESH_LEVELS } from '@/fem';
import { FACING_KEYS } from './facings';
import { DROP_SURFACE_KEYS } from './surfaces';
import { slugSchema } from '@/lib/validation/cultivars';
import { STAGES } from '@/lib/properties/quantities';

/**
 * A number in a stated range; `unit` goes into the message so the user sees what is meant, and
 * into the schema's metadata, where the forms read it (see lib/checks/field-units.ts): a field
 * cannot be declared without the SI unit its value is converted from.
 */
export const measure = (label: string, unit: string, min: number, max: number, open = true) =>
  z
    .number({ error: `${label} must be a number (${unit}).` })
    .refine(Number.isFinite, `${label} must be a finite number.`)
    .refine((v) => (open ? v > min : v >= min), `${label} must be above ${min} ${unit}.`)
    .refine((v) => v <= max, `${label} must be at most ${max} ${unit}.`)
    .meta({ unit: unit || '–' });

const poisson = z
  .number({ error: "Poisson's ratio must be a number." })
  .refine(
    (v) => Number.isFinite(v) && v >= 0 && v < 0.5,
    "Poisson's ratio must be from 0 up to (not including) 0.5.",
  )
  .meta({ unit: '–' });

/** The fruit, from a cultivar's published values and/or the user's own figures. */
export const fruitSchema = {
  cultivar: slugSchema.optional(),
  /** The ripeness stage whose values the check should take, where values are staged. */
  stage: z.enum(STAGES, { error: 'Stage must be firm, firm-ripe or ripe.' }).optional(),
  modulusMpa: measure("Young's modulus", 'MPa', 0, 1000).optional(),
  poisson: poisson.optional(),
  diameterMm: measure('Diameter', 'mm', 0, 500).optional(),
  axialMm: measure('Axial diameter', 'mm', 0, 500).optional(),
  massG: measure('Mass', 'g', 0, 20_000).optional(),
  densityKgM3: measure('Density', 'kg/m³', 0, 3000).optional(),
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
    /** The grade rule the bruise is judged by (its slug); the commodity's strictest by default. */
    gradeRule: slugSchema.optional(),
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
    /** The grade rule the bruise is judged by (its slug); the commodity's strictest by default. */
    gradeRule: slugSchema.optional(),
  })
  .strict();

export type StackCheckInput = z.infer<typeof stackCheckSchema>;

export const squeezeCheckSchema = z
  .object({
    ...fruitSchema,
    /** Omit both for flat plates wider than the contact. */
    padDiameterMm: measure('Pad diameter', 'mm', 0, 300).optional(),
    padEdgeMm: measure('Pad edge radius', 'mm', 0, 100).optional(),
    facing: z
      .enum(FACING_KEYS, { error: `Facing must be one of ${FACING_KEYS.join(', ')}.` })
      .default('rigid'),
    facingModulusMpa: measure('Facing modulus', 'MPa', 0, 100_000).optional(),
    facingThicknessMm: measure('Facing thickness', 'mm', 0, 100).optional(),
    facingPoisson: poisson.optional(),
    friction: measure('Friction coefficient', '', 0, 2).optional(),
    safetyFactor: measure('Safety factor', '', 0.999, 20).default(2),
    accelerationMs2: measure('Peak acceleration of the move', 'm/s²', -0.001, 100).default(0),
    /** Sideways acceleration of the move, square to the pad axis (the worst direction). */
    horizontalAccelerationMs2: measure(
      'Sideways acceleration of the move',
      'm/s²',
      -0.001,
      100,
    ).default(0),
    /** Distance of the pad axis from the fruit's centre of mass. */
    gripOffsetMm: measure('Grip offset from the centre of mass', 'mm', -0.001, 200).default(0),
    /** Omitted: chosen from the fruit's size (see AUTO_TRAVEL in the squeeze resolver). */
    maxTravelMm: measure('Maximum travel per pad', 'mm', 0, 100).optional(),
    /** How long the grip holds the fruit (the transfer); omitted: the grip at t = 0 only. */
    holdSeconds: measure('Hold time', 's', 0, 3600).optional(),
    mesh: z
      .enum(MESH_LEVELS, {
        error: (issue) => {
          const renamed = RENAMED_MESH_LEVELS[String(issue.input)];
          return renamed
            ? `Mesh level '${String(issue.input)}' is now called '${renamed}'.`
            : `Mesh level must be one of ${MESH_LEVELS.join(', ')}.`;
        },
      })
      .default('balanced'),
    /** The grade rule the bruise is judged by (its slug); the commodity's strictest by default. */
    gradeRule: slugSchema.optional(),
    sweep: z.boolean().default(true),
  })
  .strict()
  .superRefine((v, ctx) => {
    if (v.padDiameterMm === undefined && v.padEdgeMm !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['padDiameterMm'],
        message: 'Give the pad diameter with its edge radius.',
      });
    }
    if (
      v.padDiameterMm !== undefined &&
      v.padEdgeMm !== undefined &&
      v.padEdgeMm >= v.padDiameterMm / 2
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['padEdgeMm'],
        message: 'The edge radius must be less than half the pad diameter.',
      });
    }
    if (v.facing === 'custom') {
      for (const [key, label] of [
        ['facingModulusMpa', 'modulus (MPa)'],
        ['facingThicknessMm', 'thickness (mm)'],
      ] as const) {
        if (v[key] === undefined)
          ctx.addIssue({ code: 'custom', path: [key], message: `Give the facing ${label}.` });
      }
    }
  });

export type SqueezeCheckInput = z.infer<typeof squeezeCheckSchema>;

export const probabilityCheckSchema = z.object({
  samples: z
    .number()
    .int('Samples must be a whole number.')
    .min(50, 'At least 50 samples.')
    .max(5000, 'At most 5000 samples.')
    .default(1000),
  seed: z
    .number()
    .int()
    .min(0)
    .max(2 ** 31)
    .default(1),
});
