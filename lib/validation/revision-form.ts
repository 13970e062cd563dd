import type { FieldErrors } from '@/lib/errors';
import type { RevisionValue } from '@/lib/properties/records';

/**
 * The draft form's field names: `summary` and, per value row i, `values.<i>.<field>`. The rows
 * become the JSON shape `draftUpdateSchema` validates, so the form and the API share one set of
 * rules and the data layer's error keys (`values.3.low`) name form fields directly.
 */
export const VALUE_FIELDS = [
  'quantity',
  'variant',
  'value',
  'low',
  'high',
  'sd',
  'samples',
  'method',
  'ripeness',
  'temperature',
  'storage',
  'loadingRate',
  'probe',
  'note',
  'stage',
  'observation',
  'isTypicalDefault',
  'typicalBasis',
  'sourceKey',
] as const;
export type ValueField = (typeof VALUE_FIELDS)[number];
export type ValueFields = Record<ValueField, string>;

/** More rows than the schema accepts still become an error message, not a huge array. */
const MAX_ROWS = 201;
const NAME = /^values\.(\d{1,4})\.([A-Za-z]+)$/;

export const fieldName = (row: number, field: ValueField) => `values.${row}.${field}`;

const isValueField = (f: string): f is ValueField =>
  (VALUE_FIELDS as readonly string[]).includes(f);

/** `values.<i>.<field>` for a known field. */
export function isFormFieldName(name: string): boolean {
  const m = NAME.exec(name);
  return Boolean(m && isValueField(m[2]));
}

export function emptyValueFields(): ValueFields {
  const out = {} as ValueFields;
  for (const f of VALUE_FIELDS) out[f] = '';
  return out;
}

/** A stored value as the strings its form row starts with. */
export function valueFieldsOf(v: RevisionValue): ValueFields {
  const s = (x: string | number | null) => (x == null ? '' : String(x));
  return {
    quantity: v.quantity,
    variant: v.variant,
    value: s(v.value),
    low: s(v.low),
    high: s(v.high),
    sd: s(v.sd),
    samples: s(v.samples),
    method: s(v.method),
    ripeness: s(v.ripeness),
    temperature: s(v.temperature),
    storage: s(v.storage),
    loadingRate: s(v.loadingRate),
    probe: s(v.probe),
    note: s(v.note),
    stage: v.stage ?? '',
    observation: v.observation ?? '',
    isTypicalDefault: v.isTypicalDefault ? 'true' : '',
    typicalBasis: v.typicalBasis ?? '',
    sourceKey: v.source?.key ?? '',
  };
}

/**
 * The value rows named in a form, in index order, with the index each came from. Unknown
 * names (`values.0.__proto__`, `values.x.value`) are ignored; the rows are fresh objects with
 * only the known fields.
 */
export function valueRowsOf(fields: Record<string, string>): {
  rows: ValueFields[];
  order: number[];
} {
  const byIndex = new Map<number, ValueFields>();
  for (const [name, raw] of Object.entries(fields)) {
    const m = NAME.exec(name);
    if (!m || !isValueField(m[2])) continue;
    const index = Number(m[1]);
    if (!byIndex.has(index)) {
      if (byIndex.size >= MAX_ROWS) continue;
      byIndex.set(index, emptyValueFields());
    }
    byIndex.get(index)![m[2]] = raw;
  }
  const order = [...byIndex.keys()].sort((a, b) => a - b);
  return { rows: order.map((i) => byIndex.get(i)!), order };
}

/** One row's strings as the schema's input: an empty value stays missing (not 0). */
function valueInput(row: ValueFields) {
  return {
    ...row,
    value: row.value.trim() === '' ? undefined : row.value,
    isTypicalDefault: row.isTypicalDefault === 'true' || row.isTypicalDefault === 'on',
  };
}

/** The form's fields → `draftUpdateSchema` input, and the form index of each value row. */
export function draftInputOf(fields: Record<string, string>) {
  const { rows, order } = valueRowsOf(fields);
  return {
    input: { summary: fields.summary ?? '', values: rows.map(valueInput) },
    order,
  };
}

/** Error keys for compacted rows (`values.2.low`) back to the form's own indices. */
export function formFieldErrors(errors: FieldErrors, order: number[]): FieldErrors {
  const out: FieldErrors = {};
  for (const [key, messages] of Object.entries(errors)) {
    const m = /^values\.(\d+)\.(.+)$/.exec(key);
    const index = m ? order[Number(m[1])] : undefined;
    out[m && index !== undefined ? `values.${index}.${m[2]}` : key] = messages;
  }
  return out;
}
