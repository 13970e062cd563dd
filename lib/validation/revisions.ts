import { z } from 'zod';
import { parseNumberText } from '@/lib/number-text';
import {
  OBSERVATIONS,
  OBSERVED_QUANTITIES,
  QUANTITIES,
  QUANTITY_KEYS,
  STAGES,
  TYPICAL_BASES,
  variantsOf,
  type Quantity,
} from '@/lib/properties/quantities';

/** Plausible bounds per quantity, in its canonical unit: a typo (kPa typed as Pa) is refused. */
const BOUNDS: Record<Quantity, { min: number; max: number; minOpen?: boolean; maxOpen?: boolean }> =
  {
    youngs_modulus: { min: 0, max: 100_000, minOpen: true },
    poisson_ratio: { min: 0, max: 0.5, maxOpen: true },
    density: { min: 0, max: 3000, minOpen: true },
    diameter: { min: 0, max: 1000, minOpen: true },
    mass: { min: 0, max: 100_000, minOpen: true },
    static_bruise_threshold: { min: 0, max: 1_000_000, minOpen: true },
    failure_stress: { min: 0, max: 1_000_000, minOpen: true },
    bioyield_stress: { min: 0, max: 1_000_000, minOpen: true },
    penetrometer_firmness: { min: 0, max: 2000, minOpen: true },
    impact_threshold_energy: { min: 0, max: 1000, minOpen: true },
    drop_threshold_height: { min: 0, max: 100_000, minOpen: true },
    friction_coefficient: { min: 0, max: 5, minOpen: true },
    bulk_density: { min: 0, max: 3000, minOpen: true },
    lateral_pressure_ratio: { min: 0, max: 1, minOpen: true },
    bruise_susceptibility: { min: 0, max: 1_000_000, minOpen: true },
    relaxation_k1: { min: 0, max: 1_000_000, minOpen: true },
    relaxation_k2: { min: 1, max: 1000 },
    angle_of_repose: { min: 0, max: 90, minOpen: true, maxOpen: true },
  };

function inBounds(q: Quantity, v: number): boolean {
  const b = BOUNDS[q];
  const lowOk = b.minOpen ? v > b.min : v >= b.min;
  const highOk = b.maxOpen ? v < b.max : v <= b.max;
  return lowOk && highOk;
}

function boundsText(q: Quantity): string {
  const b = BOUNDS[q];
  const unit = QUANTITIES[q].unit === '–' ? '' : ` ${QUANTITIES[q].unit}`;
  return `${b.minOpen ? 'above' : 'from'} ${b.min} ${b.maxOpen ? 'and below' : 'up to'} ${b.max}${unit}`;
}

// Typed text is read by the shared parser: "20,5" is 20.5; "1,234,5" is refused with its reason.
const number = (label: string) =>
  z.preprocess(
    (v, ctx) => {
      if (typeof v !== 'string') return v;
      const n = parseNumberText(v);
      if (n.ok) return n.value ?? v;
      // Words stay "must be a number"; a number whose marks have no one meaning says why.
      if (!/^[\s\d.,+\-\u2212eE]+$/.test(v)) return v;
      ctx.addIssue({ code: 'custom', message: `${label}: ${n.message}` });
      return z.NEVER;
    },
    z.coerce
      .number({ error: `${label} must be a number.` })
      .refine(Number.isFinite, `${label} must be a finite number.`),
  );
const optionalNumber = (label: string) =>
  z.preprocess((v) => (v === '' || v === undefined ? null : v), number(label).nullable());
const text = (max: number) =>
  z.preprocess(
    (v) => (typeof v === 'string' && v.trim() === '' ? null : v),
    z.string().trim().max(max, `At most ${max} characters.`).nullable().default(null),
  );

export const revisionValueSchema = z
  .object({
    quantity: z.enum(QUANTITY_KEYS, { error: 'Choose a quantity from the list.' }),
    variant: z.string().trim().max(60).default(''),
    value: number('The value'),
    low: optionalNumber('The low end'),
    high: optionalNumber('The high end'),
    sd: optionalNumber('The standard deviation'),
    samples: z.preprocess(
      (v) => (v === '' || v === undefined ? null : v),
      z.coerce.number().int('Samples must be a whole number.').positive().max(1_000_000).nullable(),
    ),
    method: text(300),
    ripeness: text(120),
    temperature: text(60),
    storage: text(200),
    loadingRate: text(60),
    probe: text(120),
    note: text(1000),
    /** The ripeness stage the value was measured at, where the source stages its values. */
    stage: z.preprocess(
      (v) => (v === '' || v === undefined ? null : v),
      z.enum(STAGES, { error: 'Choose firm, firm-ripe or ripe (or leave it empty).' }).nullable(),
    ),
    /** For drop and impact figures: a no-bruise threshold, a level that bruised, or a maximum. */
    observation: z.preprocess(
      (v) => (v === '' || v === undefined ? null : v),
      z
        .enum(OBSERVATIONS, {
          error: 'Choose what was observed: no bruise, bruised at, or a recommended maximum.',
        })
        .nullable(),
    ),
    isTypicalDefault: z.boolean().default(false),
    /** Why a typical value is kept: the trade's common practice, or recalled from memory. */
    typicalBasis: z.preprocess(
      (v) => (v === '' || v === undefined ? null : v),
      z
        .enum(TYPICAL_BASES, { error: 'Say whether it is common practice or from memory.' })
        .nullable(),
    ),
    sourceKey: text(80),
  })
  .superRefine((v, ctx) => {
    const issue = (path: string, message: string) =>
      ctx.addIssue({ code: 'custom', path: [path], message });
    if (!variantsOf(v.quantity).includes(v.variant)) {
      issue(
        'variant',
        `Choose one of: ${variantsOf(v.quantity)
          .map((x) => x || '(none)')
          .join(', ')}.`,
      );
    }
    for (const key of ['value', 'low', 'high'] as const) {
      const x = v[key];
      if (x !== null && !inBounds(v.quantity, x)) {
        issue(key, `${QUANTITIES[v.quantity].label} must be ${boundsText(v.quantity)}.`);
      }
    }
    if ((v.low === null) !== (v.high === null))
      issue('high', 'Give both ends of the range, or neither.');
    if (v.low !== null && v.high !== null && !(v.low <= v.value && v.value <= v.high)) {
      issue('low', 'The range must contain the value (low ≤ value ≤ high).');
    }
    if (v.sd !== null && v.sd < 0) issue('sd', 'The standard deviation cannot be negative.');
    const observed = (OBSERVED_QUANTITIES as readonly string[]).includes(v.quantity);
    if (observed && v.observation === null)
      issue(
        'observation',
        'Say what kind of observation this is: no bruise at this level, fruit bruised at it, or a recommended maximum.',
      );
    if (!observed && v.observation !== null)
      issue('observation', 'Only drop and impact figures carry an observation kind.');
    if (v.isTypicalDefault && v.typicalBasis === null)
      issue('typicalBasis', 'Say why this typical value is kept: common practice or from memory.');
    if (!v.isTypicalDefault && v.typicalBasis !== null)
      issue(
        'typicalBasis',
        'Only a typical value has a basis; a published value names its source.',
      );
    if (!v.isTypicalDefault && !v.sourceKey) {
      issue('sourceKey', 'Name the source of this value, or mark it as a typical default.');
    }
  });

export const draftUpdateSchema = z
  .object({
    summary: text(500),
    values: z.array(revisionValueSchema).max(200, 'At most 200 values in one revision.'),
  })
  .strict();

export const reviewCommentSchema = z.object({
  comment: z
    .string({ error: 'Say what should change.' })
    .trim()
    .min(3, 'Say what should change (at least 3 characters).')
    .max(2000, 'At most 2000 characters.'),
});

export type RevisionValueInput = z.infer<typeof revisionValueSchema>;
export type DraftUpdateInput = z.infer<typeof draftUpdateSchema>;
