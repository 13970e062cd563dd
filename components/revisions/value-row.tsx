'use client';

import { Field } from '@/components/ui/field';
import type { FieldErrors } from '@/lib/errors';
import {
  isQuantity,
  QUANTITIES,
  QUANTITY_KEYS,
  variantsOf,
  type Quantity,
} from '@/lib/properties/quantities';
import { fieldName, type ValueField, type ValueFields } from '@/lib/validation/revision-form';
import { SelectField } from './select-field';
import { SourceSelect, type SourceChoice } from './source-select';

const unitOf = (q: Quantity | null) =>
  q === null ? '' : QUANTITIES[q].unit === '–' ? ' (no unit)' : ` (${QUANTITIES[q].unit})`;

const NUMBERS: [ValueField, string][] = [
  ['value', 'Value'],
  ['low', 'Low'],
  ['high', 'High'],
  ['sd', 'Std. dev.'],
];
const CONDITIONS: [ValueField, string, number][] = [
  ['method', 'Method', 300],
  ['ripeness', 'Ripeness', 120],
  ['temperature', 'Temperature', 60],
  ['storage', 'Storage', 200],
  ['loadingRate', 'Loading rate', 60],
  ['probe', 'Probe or plate', 120],
];

interface Props {
  index: number;
  fields: ValueFields;
  errors: FieldErrors;
  sources: SourceChoice[];
  onChange: (field: ValueField, value: string) => void;
  onRemove: () => void;
}

/** One value of a draft: what was measured, the number and its spread, conditions, source. */
export function ValueRow({ index, fields, errors, sources, onChange, onRemove }: Props) {
  const name = (f: ValueField) => fieldName(index, f);
  const quantity = isQuantity(fields.quantity) ? fields.quantity : null;
  const text = (f: ValueField) => ({
    name: name(f),
    value: fields[f],
    errors: errors[name(f)],
    onChange: (e: { target: { value: string } }) => onChange(f, e.target.value),
  });
  return (
    <fieldset
      className="min-w-0 rounded-lg border border-stone-200 bg-white p-3"
      data-testid="value-row"
    >
      <legend className="px-1 text-sm font-semibold">
        Value {index + 1}
        {quantity
          ? `: ${QUANTITIES[quantity].label}${fields.variant ? ` (${fields.variant})` : ''}`
          : ''}
      </legend>
      <div className="grid gap-x-3 sm:grid-cols-2">
        <SelectField
          label="Quantity"
          {...text('quantity')}
          onChange={(e) => {
            const next = e.target.value;
            onChange('quantity', next);
            if (isQuantity(next) && !variantsOf(next).includes(fields.variant))
              onChange('variant', variantsOf(next)[0]);
          }}
          hint={quantity ? QUANTITIES[quantity].hint || undefined : undefined}
        >
          <option value="">Choose a quantity…</option>
          {QUANTITY_KEYS.map((q) => (
            <option key={q} value={q}>
              {QUANTITIES[q].label}
              {unitOf(q)}
            </option>
          ))}
        </SelectField>
        <SelectField label="Variant or surface" {...text('variant')}>
          {(quantity ? variantsOf(quantity) : ['']).map((v) => (
            <option key={v} value={v}>
              {v || '(none)'}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="grid grid-cols-2 gap-x-3 sm:grid-cols-5">
        {NUMBERS.map(([f, label]) => (
          <Field key={f} label={`${label}${unitOf(quantity)}`} inputMode="decimal" {...text(f)} />
        ))}
        <Field label="Samples (n)" inputMode="numeric" {...text('samples')} />
      </div>
      <div className="grid gap-x-3 sm:grid-cols-2 lg:grid-cols-3">
        {CONDITIONS.map(([f, label, max]) => (
          <Field key={f} label={label} maxLength={max} {...text(f)} />
        ))}
      </div>
      <Field label="Note" maxLength={1000} {...text('note')} />
      <SourceSelect
        name={name('sourceKey')}
        value={fields.sourceKey}
        sources={sources}
        errors={errors[name('sourceKey')]}
        onChange={(v) => onChange('sourceKey', v)}
      />
      <div className="mt-2 flex flex-wrap items-center justify-between gap-3">
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            name={name('isTypicalDefault')}
            value="true"
            checked={fields.isTypicalDefault === 'true'}
            onChange={(e) => onChange('isTypicalDefault', e.target.checked ? 'true' : '')}
          />
          Typical default (no measurement behind it; shown as such)
        </label>
        <button
          type="button"
          onClick={onRemove}
          className="rounded-md border border-red-300 bg-white px-3 py-1.5 text-sm text-red-800 hover:bg-red-50"
        >
          Remove value {index + 1}
        </button>
      </div>
    </fieldset>
  );
}
