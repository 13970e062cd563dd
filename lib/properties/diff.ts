import { QUANTITIES, type Quantity } from './quantities';

/** The part of a value that a diff compares and shows. */
export interface DiffValue {
  quantity: Quantity;
  variant: string;
  value: number;
  unit: string;
  low: number | null;
  high: number | null;
  sd: number | null;
  sourceKey: string | null;
}

export interface DiffRow {
  quantity: Quantity;
  variant: string;
  label: string;
  change: 'added' | 'removed' | 'changed' | 'same';
  before: DiffValue[];
  after: DiffValue[];
}

const slot = (v: { quantity: string; variant: string }) => `${v.quantity}\u0000${v.variant}`;
const same = (a: DiffValue[], b: DiffValue[]) =>
  a.length === b.length &&
  a.every((x, i) =>
    (['value', 'low', 'high', 'sd', 'sourceKey'] as const).every((k) => x[k] === b[i][k]),
  );

/**
 * Compare two revisions slot by slot (quantity and variant), in the catalogue's order: each row
 * says whether the values there were added, removed or changed, with the old and new ones.
 */
export function diffRevisions(before: DiffValue[], after: DiffValue[]): DiffRow[] {
  const slots = new Map<string, { quantity: Quantity; variant: string }>();
  for (const v of [...before, ...after]) slots.set(slot(v), v);
  const order = Object.keys(QUANTITIES);
  return [...slots.values()]
    .sort(
      (a, b) =>
        order.indexOf(a.quantity) - order.indexOf(b.quantity) || a.variant.localeCompare(b.variant),
    )
    .map(({ quantity, variant }) => {
      const b = before.filter((v) => slot(v) === slot({ quantity, variant }));
      const a = after.filter((v) => slot(v) === slot({ quantity, variant }));
      const change = !b.length ? 'added' : !a.length ? 'removed' : same(b, a) ? 'same' : 'changed';
      const label = QUANTITIES[quantity].label + (variant ? ` (${variant})` : '');
      return { quantity, variant, label, change, before: b, after: a };
    });
}

/** A value as one line of text with its unit and spread, e.g. `2.4 MPa (1.5–3.3)`. */
export function formatValue(v: Pick<DiffValue, 'value' | 'unit' | 'low' | 'high' | 'sd'>): string {
  const unit = v.unit === '–' ? '' : ` ${v.unit}`;
  const n = (x: number) => String(Number(x.toPrecision(4)));
  const spread =
    v.low !== null && v.high !== null
      ? ` (${n(v.low)}–${n(v.high)})`
      : v.sd !== null
        ? ` ± ${n(v.sd)}`
        : '';
  return `${n(v.value)}${unit}${spread}`;
}
