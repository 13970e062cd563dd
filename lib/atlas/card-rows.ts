import type { CultivarRecord } from '@/lib/properties/records';
import { QUANTITIES, type Quantity } from '@/lib/properties/quantities';
import { shortCitation } from './citations';
import { formatValueIn } from '@/lib/properties/format-units';
import type { UnitSystem } from '@/lib/units';

/** The quantities a handling reader looks for first; a missing one is said to be missing. */
export const KEY_QUANTITIES: Quantity[] = [
  'youngs_modulus',
  'poisson_ratio',
  'density',
  'static_bruise_threshold',
  'failure_stress',
  'drop_threshold_height',
];

export interface CardRow {
  quantity: Quantity;
  label: string;
  /** `2.52 MPa (2.36–3.28)`, or null: no published value. */
  value: string | null;
  /** The conditions a value was measured under, shortened. */
  conditions: string | null;
  citation: string | null;
  sourceKey: string | null;
}

function conditionsOf(v: CultivarRecord['values'][number]): string | null {
  const parts = [v.ripeness, v.temperature, v.storage].filter(Boolean) as string[];
  return parts.length ? parts.join('; ') : null;
}

/** Every published value in catalogue order, then each key quantity that has none. */
export function cardRows(record: CultivarRecord, system: UnitSystem = 'si'): CardRow[] {
  const order = Object.keys(QUANTITIES);
  const values = [...record.values].sort(
    (a, b) => order.indexOf(a.quantity) - order.indexOf(b.quantity),
  );
  const rows: CardRow[] = values.map((v) => ({
    quantity: v.quantity,
    label: QUANTITIES[v.quantity].label + (v.variant ? ` (${v.variant})` : ''),
    value: formatValueIn(v, system),
    conditions: conditionsOf(v),
    citation: v.source ? shortCitation(v.source) : v.isTypicalDefault ? 'typical default' : null,
    sourceKey: v.source?.key ?? null,
  }));
  const present = new Set(values.map((v) => v.quantity));
  for (const q of KEY_QUANTITIES) {
    if (present.has(q)) continue;
    rows.push({
      quantity: q,
      label: QUANTITIES[q].label,
      value: null,
      conditions: null,
      citation: null,
      sourceKey: null,
    });
  }
  return rows;
}
