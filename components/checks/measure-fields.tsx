'use client';

import { useUnits } from '@/components/units/units-provider';
import type { ReactNode } from 'react';
import { CultivarSelect, MeasureField, publishedHint, type CultivarOption } from './check-fields';
import { FIELD_UNITS, type CheckField } from '@/lib/checks/field-units';
import { parseNumberText, readerDecimalMark } from '@/lib/number-text';
import { niceDefault, toDisplay, type UnitSystem } from '@/lib/units';
import { formEntries, initialText, type FormText } from './initial-text';

/**
 * A form's starting text: its defaults (SI) as round numbers in the reader's units (niceDefault:
 * two significant figures, or one within 2.5 %, so a 20 mm pad reads 0.8 in), and figures from
 * the page's address (SI, typed by someone before) converted without that rounding.
 */
export function startingText(defaults: FormText, fromAddress: FormText, system: UnitSystem) {
  const nice = Object.fromEntries(
    formEntries(defaults).map(([key, value]) => [
      key,
      value.trim() === '' ? '' : String(niceDefault(Number(value), FIELD_UNITS[key], system)),
    ]),
  );
  const typed = formEntries(fromAddress);
  const kept = initialText(
    Object.fromEntries(typed.filter(([, v]) => v.trim() !== '')),
    (v, unit) => toDisplay(v, unit, system),
  );
  // A field someone emptied stays empty.
  const emptied = Object.fromEntries(typed.filter(([, v]) => v.trim() === ''));
  return { ...nice, ...kept, ...emptied } as FormText;
}

/**
 * The typed figures with every readable number written plainly ("20,5" → "20.5"); a text that
 * is not one number is left as typed, so the route names its field (and the field says why).
 */
export function typedText(text: FormText): FormText {
  const mark = readerDecimalMark();
  return Object.fromEntries(
    formEntries(text).map(([key, value]) => {
      const n = parseNumberText(value, mark);
      return [key, n.ok && n.value !== null ? String(n.value) : value];
    }),
  );
}

/** Why a typed figure cannot be read, or undefined (see parseNumberText). */
function typingProblem(text: string): string[] | undefined {
  const n = parseNumberText(text, readerDecimalMark());
  return n.ok ? undefined : [n.message];
}

/** A field of a check form: its key in the route's input, its label, an optional hint. */
export type FieldSpec = readonly [key: CheckField, label: string, hint?: string];

export interface FieldsState {
  text: FormText;
  set: (key: string) => (value: string) => void;
  fieldErrors: Record<string, string[]>;
}

/**
 * Number fields in the reader's units (the SI unit comes from FIELD_UNITS); with a cultivar, each
 * empty field shows the published figure it falls back to.
 */
export function MeasureFields({
  fields,
  state,
  option,
}: {
  fields: readonly FieldSpec[];
  state: FieldsState;
  option?: CultivarOption;
}) {
  const units = useUnits();
  return fields.map(([key, label, hint]) => {
    const unit = FIELD_UNITS[key];
    return (
      <MeasureField
        key={key}
        label={label}
        unit={unit}
        hint={hint || undefined}
        value={state.text[key] ?? ''}
        onChange={state.set(key)}
        errors={typingProblem(state.text[key] ?? '') ?? state.fieldErrors[key]}
        placeholder={publishedHint(option, key, (v) => units.toDisplay(v, unit))}
      />
    );
  });
}

/** The fruit's figures: a cultivar's published values, or the user's own. */
export function FruitFieldset({
  fields,
  state,
  option,
}: {
  fields: readonly FieldSpec[];
  state: FieldsState;
  option?: CultivarOption;
}) {
  return (
    <fieldset className="space-y-3 rounded-md border border-stone-200 p-3">
      <legend className="px-1 text-xs font-medium uppercase tracking-wide text-stone-600">
        Fruit {option ? '(leave empty: the knowledge base supplies each figure)' : ''}
      </legend>
      <MeasureFields fields={fields} state={state} option={option} />
    </fieldset>
  );
}

/** The route's form-level message (the field ones sit beside their fields). */
export function CheckFormError({ message }: { message: string | null }) {
  if (!message) return null;
  return (
    <p
      className="rounded-md bg-red-50 px-3 py-2 text-sm text-red-800"
      data-testid="form-error"
      aria-live="polite"
    >
      {message}
    </p>
  );
}

/** The fruit fields the drop and stack checks share. */
export const FRUIT_FIELDS: readonly FieldSpec[] = [
  ['modulusMpa', "Young's modulus"],
  ['poisson', "Poisson's ratio"],
  ['diameterMm', 'Diameter'],
  ['massG', 'Mass'],
  ['staticThresholdKpa', 'Static bruise threshold'],
];

/**
 * A check form with the cultivar first and the fruit's figures last: the check's own fields go
 * between. `message` is the route's form-level message.
 */
export function CheckForm({
  label,
  cultivars,
  cultivar,
  setCultivar,
  stage,
  setStage,
  grade,
  fields,
  message,
  children,
}: {
  label: string;
  cultivars: CultivarOption[];
  cultivar: string;
  setCultivar: (slug: string) => void;
  stage: string;
  setStage: (stage: string) => void;
  /** For the checks that size a bruise: the grade rule it is judged by. */
  grade?: { value: string; onChange: (slug: string) => void };
  fields: FieldsState;
  message: string | null;
  children: ReactNode;
}) {
  return (
    <form className="space-y-3" onSubmit={(e) => e.preventDefault()} aria-label={label}>
      <CultivarSelect
        options={cultivars}
        value={cultivar}
        onChange={setCultivar}
        errors={fields.fieldErrors.cultivar}
        stage={{ value: stage, onChange: setStage, errors: fields.fieldErrors.stage }}
        grade={grade && { ...grade, errors: fields.fieldErrors.gradeRule }}
      />
      {children}
      <FruitFieldset
        fields={FRUIT_FIELDS}
        state={fields}
        option={cultivars.find((o) => o.slug === cultivar)}
      />
      <CheckFormError message={message} />
    </form>
  );
}
