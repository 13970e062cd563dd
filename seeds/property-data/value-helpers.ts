import type { TypicalBasis } from '@/lib/properties/quantities';
import type { SeedValue } from './types';

/**
 * A static friction coefficient from a published friction angle: μ = tan θ, to three decimals
 * (the rounding is below the angle's own precision of 0.1°).
 */
export function frictionFromAngle(
  surface: string,
  degrees: number,
  source: string,
  extra?: string,
): SeedValue {
  const mu = Number(Math.tan((degrees * Math.PI) / 180).toFixed(3));
  return {
    quantity: 'friction_coefficient',
    variant: surface,
    value: mu,
    note: `Published as a static friction angle of ${degrees}°; stored as μ = tan ${degrees}° = ${mu}.${extra ? ` ${extra}` : ''}`,
    source,
  };
}

export const TYPICAL_DEFAULT_NOTE =
  'Typical engineering default, no published source for this commodity — replace with a measured value.';

/**
 * Janssen's lateral pressure ratio for a bin check, where no source gives one for the fruit:
 * bin design practice commonly takes 0.3–0.6; 0.4 is stored, the value the stack check assumes
 * when a cultivar has none, so the two defaults agree.
 */
export function typicalJanssenK(): SeedValue {
  return {
    quantity: 'lateral_pressure_ratio',
    value: 0.4,
    low: 0.3,
    high: 0.6,
    note: `${TYPICAL_DEFAULT_NOTE} Bin design practice commonly takes K between 0.3 and 0.6; 0.4 is stored.`,
    isTypicalDefault: true,
    typicalBasis: 'common practice',
    source: null,
  };
}

/** Apparent modulus at harvest and after four months' storage (8 mm curved-end probe, 7 mm/min). */
export function storageModulus(harvest: number, stored: number, source: string): SeedValue[] {
  return [
    { value: harvest, storage: 'Harvest day' },
    { value: stored, storage: 'After 4 months of storage' },
  ].map(({ value, storage }) => ({
    quantity: 'youngs_modulus',
    variant: 'apparent',
    value,
    method: 'Whole fruit compressed by a probe',
    probe: '8 mm diameter cylinder with a curved end',
    loadingRate: '7 mm/min',
    storage,
    source,
  }));
}

/** A typical value kept only because no published one was found; its note says what was searched. */
export function typicalValue(
  v: Omit<SeedValue, 'isTypicalDefault' | 'typicalBasis' | 'source'>,
  basis: TypicalBasis,
): SeedValue {
  return { ...v, isTypicalDefault: true, typicalBasis: basis, source: null };
}

/**
 * The same with the commodity-record wording: a wide band, and a note that says the value is not
 * published for this commodity and names what was searched.
 */
export function typical(
  quantity: SeedValue['quantity'],
  variant: string,
  value: number,
  [low, high]: [number, number],
  basis: TypicalBasis,
  note: string,
  extra: Partial<SeedValue> = {},
): SeedValue {
  return {
    ...typicalValue(
      {
        quantity,
        ...(variant ? { variant } : {}),
        value,
        low,
        high,
        note: `Typical value, not published for this commodity — replace with a measured value. ${note}`,
      },
      basis,
    ),
    ...extra,
  };
}
