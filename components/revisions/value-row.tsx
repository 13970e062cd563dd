'use client';

import { Field } from '@/components/ui/field';
import type { FieldErrors } from '@/lib/errors';
import { FROM_MEMORY } from '@/lib/properties/citation';
import {
  isQuantity,
  OBSERVATION_LABELS,
  OBSERVATIONS,
  OBSERVED_QUANTITIES,
  STAGE_LABELS,
  STAGES,
  TYPICAL_BASES,
  QUANTITIES,
  QUANTITY_KEYS,
  variantsOf,
  type Quantity,
} from '@/lib/properties/quantities';
import { fieldName, type ValueField, type ValueFields } from '@/lib/validation/revision-form';
import { FIELD_LABELS } from './field-labels';
import { SelectField } from './select-field';
import { SourceSelect, type SourceChoice } from './source-select';

const unitOf = (q: Quantity | null) =>
  q === null ? '' : QUANTITIES[q].unit === '–' ? ' (no unit)' : ` (${QUANTITIES[q].unit})`;

const NUMBERS: ValueField[] = ['value', 'low', 'high', 'sd'];
/** Condition fields and their length limits (as the schema has them). */
const CONDITIONS: [ValueField, number][] = [
  ['method', 300],
  ['ripeness', 120],
  ['temperature', 60],
  ['storage', 200],
  ['loadingRate', 60],
  ['probe', 120],
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
          label={FIELD_LABELS.quantity}
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
        <SelectField label={FIELD_LABELS.variant} {...text('variant')}>
          {(quantity ? variantsOf(quantity) : ['']).map((v) => (
            <option key={v} value={v}>
              {v || '(none)'}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="grid grid-cols-2 gap-x-3 sm:grid-cols-5">
        {NUMBERS.map((f) => (
          <Field
            key={f}
            label={`${FIELD_LABELS[f]}${unitOf(quantity)}`}
            inputMode="decimal"
            {...text(f)}
          />
        ))}
        <Field label={FIELD_LABELS.samples} inputMode="numeric" {...text('samples')} />
      </div>
      <div className="grid gap-x-3 sm:grid-cols-2 lg:grid-cols-3">
        {CONDITIONS.map(([f, max]) => (
          <Field key={f} label={FIELD_LABELS[f]} maxLength={max} {...text(f)} />
        ))}
      </div>
      <div className="grid gap-x-3 sm:grid-cols-2">
        <SelectField label={FIELD_LABELS.stage} {...text('stage')}>
          <option value="">Not staged</option>
          {STAGES.map((s) => (
            <option key={s} value={s}>
              {STAGE_LABELS[s]}
            </option>
          ))}
        </SelectField>
        {quantity && (OBSERVED_QUANTITIES as readonly string[]).includes(quantity) ? (
          <SelectField label={FIELD_LABELS.observation} {...text('observation')}>
            <option value="">Choose…</option>
            {OBSERVATIONS.map((o) => (
              <option key={o} value={o}>
                {OBSERVATION_LABELS[o]}
              </option>
            ))}
          </SelectField>
        ) : null}
      </div>
      <Field label={FIELD_LABELS.note} maxLength={1000} {...text('note')} />
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
        {fields.isTypicalDefault === 'true' ? (
          <SelectField label={FIELD_LABELS.typicalBasis} {...text('typicalBasis')}>
            <option value="">Choose…</option>
            {TYPICAL_BASES.map((b) => (
              <option key={b} value={b}>
                {b === 'common practice' ? 'common practice, no single source' : FROM_MEMORY}
              </option>
            ))}
          </SelectField>
        ) : null}
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
