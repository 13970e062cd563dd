import type { CultivarRecord, RevisionValue } from './records';
import { QUANTITIES, type Quantity } from './quantities';

/** The unit suffix of a JSON key: `youngs_modulus_mpa`, `density_kg_m3`, `poisson_ratio`. */
const UNIT_SUFFIX: Record<string, string> = {
  MPa: '_mpa',
  kPa: '_kpa',
  'kg/m³': '_kg_m3',
  mm: '_mm',
  g: '_g',
  J: '_j',
  '–': '',
};

export function keyOf(quantity: Quantity): string {
  return quantity + UNIT_SUFFIX[QUANTITIES[quantity].unit];
}

/** One value as the API gives it: value, unit, spread, conditions and source together. */
export function valueJson(v: RevisionValue) {
  return {
    quantity: v.quantity,
    key: keyOf(v.quantity),
    variant: v.variant || null,
    value: v.value,
    unit: v.unit,
    spread: { low: v.low, high: v.high, sd: v.sd, samples: v.samples },
    conditions: {
      method: v.method,
      ripeness: v.ripeness,
      temperature: v.temperature,
      storage: v.storage,
      loading_rate: v.loadingRate,
      probe: v.probe,
      note: v.note,
    },
    typical_default: v.isTypicalDefault,
    source: v.source,
  };
}

/** The headline figures of a cultivar: the first published value of each quantity, or null. */
export function headline(values: RevisionValue[]): Record<string, number | null> {
  const out: Record<string, number | null> = {};
  for (const q of Object.keys(QUANTITIES) as Quantity[]) {
    out[keyOf(q)] = values.find((v) => v.quantity === q)?.value ?? null;
  }
  return out;
}

export function cultivarJson(c: CultivarRecord) {
  return {
    slug: c.slug,
    name: c.name,
    commodity: { slug: c.commodity.slug, name: c.commodity.name, family: c.commodity.family },
    is_type: c.isType,
    revision: c.published
      ? { id: c.published.id, number: c.published.number, published_at: c.published.publishedAt }
      : null,
    ...headline(c.values),
    values: c.values.map(valueJson),
  };
}
