import { z } from 'zod';
import { textSchema } from '@/lib/phrase';
import { bruiseSchema } from '../bruise';
import { evidenceSummarySchema } from '../evidence-summary';
import { fruitUsedShape, pinnedSchema, usedValueSchema, verdictSchema } from '../used-value';

const n = z.number();
const nn = z.number().nullable();

/** One squeeze state of the axisymmetric model (display units named in the keys). */
const stateSchema = z.looseObject({
  travel_per_pad_mm: nn,
  force_n: nn,
  contact_radius_mm: nn,
  peak_pressure_kpa: nn,
  mean_pressure_kpa: nn,
  max_shear_kpa: nn,
  max_shear_depth_mm: nn,
  max_shear_unavailable: z.string().nullable(),
  contact_points: n,
  facing_strain: nn,
  lift_ratio: nn.optional(),
});

const gripSchema = stateSchema.extend({ bruise_margin: nn, shear_margin: nn });

/** The squeeze check's result as it is answered and saved (schema `squeeze/2`: every used figure with its rung; `squeeze/1` results are read through the same schema). */
export const squeezeResultSchema = z.object({
  check: z.literal('squeeze'),
  pinned: pinnedSchema,
  inputs_used: z.object({
    ...fruitUsedShape,
    density_kg_m3: usedValueSchema,
    friction: usedValueSchema,
    failure_stress_kpa: usedValueSchema.nullable(),
    pad_diameter_mm: nn,
    pad_edge_mm: nn,
    facing: z.string(),
    facing_basis: z.string(),
    safety_factor: n,
    acceleration_m_s2: n,
    /** Sideways acceleration and the grip's offset (absent in results saved before them). */
    horizontal_acceleration_m_s2: n.optional(),
    grip_offset_mm: n.optional(),
    max_travel_mm: n,
    /** True when the travel was chosen from the fruit's size (absent in older results). */
    max_travel_auto: z.boolean().optional(),
    /** The hold time and the relaxation pair it used (absent in results saved before holds). */
    hold_time_s: nn.optional(),
    relaxation_k1_s: usedValueSchema.nullable().optional(),
    relaxation_k2: usedValueSchema.nullable().optional(),
  }),
  margin: z.object({ value: n, basis: z.literal('static'), verdict: verdictSchema }).nullable(),
  // The model's own answer (fem's squeezeResultJson): the parts the app reads are typed; the
  // rest (mesh, Hertz comparison, units) is kept as it came.
  model: z.looseObject({
    steps: z.array(stateSchema),
    final: stateSchema,
    profile: z.array(z.object({ r_mm: nn, pressure_kpa: nn })),
    liftability: z
      .looseObject({ grip: gripSchema.nullable(), grip_reason: z.string().nullable() })
      .nullable(),
    warnings: z.array(z.object({ code: z.string(), message: z.string() })),
  }),
  grip_profile: z.array(z.object({ r_mm: nn, pressure_kpa: nn })).nullable(),
  /** The bruise at the grip point against the chosen grade rule (absent: older results). */
  bruise: bruiseSchema.nullable().optional(),
  sweep: z
    .object({
      points: z.array(
        z.object({
          pad_diameter_mm: nn,
          bruise_margin: nn,
          grip_force_n: nn,
          grip_peak_pressure_kpa: nn,
          reason: z.string().nullable(),
        }),
      ),
      smallest_safe_pad_mm: nn,
    })
    .nullable(),
  slip: z
    .object({
      holds: z.boolean().nullable(),
      reason: z.string().nullable(),
      lift_load_n: nn.optional(),
      design_load_n: nn.optional(),
      utilisation: nn.optional(),
      contact_radius_mm: nn.optional(),
      stick_radius_mm: nn.optional(),
      slip_annulus_mm: z.object({ inner: nn, outer: nn }).optional(),
      nodes: z
        .array(
          z.object({
            r_mm: nn,
            state: z.enum(['stick', 'slip', 'open']),
            traction_kpa: nn,
            pressure_kpa: nn,
          }),
        )
        .optional(),
    })
    .nullable(),
  /** Force and twist of the move at the grip (absent in results saved before it). */
  twist: z
    .object({
      offset_mm: n,
      resultant_acceleration_m_s2: n,
      load_n: n,
      torque_n_m: n,
      capacity_n_m: n,
      shape_factor: n,
      lift_utilisation: n,
      twist_utilisation: nn,
      combined_utilisation: nn,
      governs: z.enum(['lift', 'twist']),
      holds_at_grip: z.boolean(),
      holding: z
        .object({
          travel_per_pad_mm: nn,
          force_n: nn,
          peak_pressure_kpa: nn,
          bruise_margin: nn,
          reason: z.string().nullable(),
        })
        .nullable(),
    })
    .nullable()
    .optional(),
  /** The grip held over time as the flesh relaxes (absent: no hold time given, or older results). */
  hold: z
    .object({
      seconds: n,
      relaxation: z.boolean(),
      retained_at_end: nn,
      safety_at_end: nn,
      grip_slips_after_s: nn,
      curve: z
        .array(
          z.object({
            t_s: n,
            grip_force_n: nn,
            grip_lift_ratio: n,
            held_force_n: nn,
            held_lift_ratio: nn,
          }),
        )
        .nullable(),
      held: z
        .object({
          travel_per_pad_mm: n,
          force_n: n,
          force_end_n: n,
          peak_pressure_kpa: n,
          bruise_margin: nn,
        })
        .nullable(),
      held_reason: z.string().nullable(),
    })
    .nullable()
    .optional(),
  /** Sentences, their measures shown in the reader's units (strings in older results). */
  warnings: z.array(textSchema),
  /** The weakest rung of evidence the verdict rests on (absent in results saved before it). */
  evidence: evidenceSummarySchema.optional(),
});

export type SqueezeResult = z.infer<typeof squeezeResultSchema>;
