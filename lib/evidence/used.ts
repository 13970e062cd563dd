import { z } from 'zod';
import { RUNGS, type Rung } from './rungs';

/** Old results (before the evidence ladder) said `origin`; read them as the rung they meant. */
const LEGACY_ORIGIN: Record<string, Rung> = {
  published: 'own',
  derived: 'derived',
  entered: 'entered',
  'typical default': 'typical',
};

function fromLegacy(raw: unknown): unknown {
  if (!raw || typeof raw !== 'object' || 'rung' in raw || !('origin' in raw)) return raw;
  const { origin, ...rest } = raw as Record<string, unknown>;
  return { note: null, spread: null, ...rest, rung: LEGACY_ORIGIN[String(origin)] ?? origin };
}

/**
 * A figure a check used: its value and unit, the rung of the evidence ladder it came from, the
 * citation of its source (or how it was worked out), a note (a stage that differs from the one
 * chosen, a derivation, why a typical value is kept), and the band the probability of bruising
 * samples (low–high or SD) with `spread` saying how that band was chosen.
 */
export const usedValueSchema = z.preprocess(
  fromLegacy,
  z.object({
    value: z.number(),
    unit: z.string(),
    rung: z.enum(RUNGS),
    source: z.string().nullable(),
    note: z.string().nullable(),
    low: z.number().nullable(),
    high: z.number().nullable(),
    sd: z.number().nullable(),
    spread: z.string().nullable(),
  }),
);

export type UsedValue = z.infer<typeof usedValueSchema>;

/** A figure the user typed: it wins over every rung, and carries no spread of its own. */
export function enteredValue(value: number, unit: string): UsedValue {
  return {
    value,
    unit,
    rung: 'entered',
    source: null,
    note: null,
    low: null,
    high: null,
    sd: null,
    spread: null,
  };
}
