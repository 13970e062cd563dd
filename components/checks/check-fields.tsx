'use client';

import { useId } from 'react';
import { useUnits } from '@/components/units/units-provider';
import { RUNG_SHORT, type Rung } from '@/lib/evidence/rungs';
import { STAGE_LABELS, STAGES } from '@/lib/properties/quantities';

/** A number input with its unit beside it and its error below, announced politely. */
export function MeasureField({
  label,
  unit,
  value,
  onChange,
  placeholder,
  errors,
  hint,
}: {
  label: string;
  unit: string;
  value: string;
  onChange: (value: string) => void;
  placeholder?: string;
  errors?: string[];
  hint?: string;
}) {
  const id = useId();
  const units = useUnits();
  const describedBy = `${id}-note`;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          inputMode="decimal"
          value={value}
          placeholder={placeholder}
          onChange={(e) => onChange(e.target.value)}
          aria-invalid={errors?.length ? true : undefined}
          aria-describedby={describedBy}
          className="num w-36 rounded-md border border-stone-300 bg-white px-2 py-1 text-sm aria-[invalid=true]:border-red-600"
        />
        <span className="text-sm text-stone-600">{units.unit(unit)}</span>
      </div>
      <p id={describedBy} aria-live="polite" className="text-xs">
        {errors?.length ? (
          <span className="text-red-700">{errors.join(' ')}</span>
        ) : hint ? (
          <span className="text-stone-500">{hint}</span>
        ) : null}
      </p>
    </div>
  );
}

export interface CultivarOption {
  slug: string;
  label: string;
  prefill: Record<string, { value: number; rung: Rung } | undefined>;
  complete: boolean;
  /** The grade rules its bruise may be judged by (its commodity's first). */
  grades?: { slug: string; name: string }[];
}

/**
 * The placeholder of a fruit field: the figure the check takes when nothing is typed, with the
 * rung of evidence it comes from in words, or a prompt when no rung has one.
 */
export function publishedHint(
  option: CultivarOption | undefined,
  key: string,
  toDisplay: (value: number) => number,
): string {
  if (!option) return '';
  const v = option.prefill[key];
  return v === undefined
    ? 'no value: enter one'
    : `${Number(toDisplay(v.value).toPrecision(4))} (${RUNG_SHORT[v.rung]})`;
}

/** A select beside the cultivar: an empty first choice, the options, and a note or an error. */
function ChoiceSelect({
  label,
  testId,
  empty,
  options,
  note,
  value,
  onChange,
  errors,
}: {
  label: string;
  testId: string;
  empty: string;
  options: { value: string; label: string }[];
  note: string;
  value: string;
  onChange: (value: string) => void;
  errors?: string[];
}) {
  const id = useId();
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-medium">
        {label}
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-describedby={`${id}-note`}
        className="w-full max-w-xs rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm"
        data-testid={testId}
      >
        <option value="">{empty}</option>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <p id={`${id}-note`} aria-live="polite" className="text-xs text-stone-500">
        {errors?.length ? <span className="text-red-700">{errors.join(' ')}</span> : note}
      </p>
    </div>
  );
}

type Choice = { value: string; onChange: (value: string) => void; errors?: string[] };

/** The ripeness stage whose values a check takes, where the knowledge base stages them. */
export function StageSelect(p: Choice) {
  return (
    <ChoiceSelect
      {...p}
      label="Ripeness stage"
      testId="stage-select"
      empty="Any (unstaged values first)"
      options={STAGES.map((s) => ({ value: s, label: STAGE_LABELS[s] }))}
      note="A value measured at another stage is used only with a warning."
    />
  );
}

/** The grade rule a bruise is judged by; empty takes the commodity's strictest standard. */
export function GradeRuleSelect({
  rules,
  ...p
}: Choice & { rules: { slug: string; name: string }[] }) {
  return (
    <ChoiceSelect
      {...p}
      label="Grade rule for the bruise"
      testId="grade-select"
      empty="The commodity's strictest published rule"
      options={rules.map((r) => ({ value: r.slug, label: r.name }))}
      note="The verdict compares the predicted bruise with this rule; the onset margin stays beside it."
    />
  );
}

export function CultivarSelect({
  options,
  value,
  onChange,
  errors,
  stage,
  grade,
}: {
  options: CultivarOption[];
  value: string;
  onChange: (slug: string) => void;
  errors?: string[];
  /** The stage choice, shown under the cultivar once one is chosen. */
  stage?: { value: string; onChange: (stage: string) => void; errors?: string[] };
  /** The grade rule choice, for the checks that size a bruise. */
  grade?: { value: string; onChange: (slug: string) => void; errors?: string[] };
}) {
  const id = useId();
  return (
    <div className="space-y-3">
      <div className="space-y-1">
        <label htmlFor={id} className="block text-sm font-medium">
          Cultivar
        </label>
        <select
          id={id}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          aria-describedby={`${id}-note`}
          className="w-full max-w-xs rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm"
        >
          <option value="">Custom values (no cultivar)</option>
          {options.map((o) => (
            <option key={o.slug} value={o.slug}>
              {o.label}
            </option>
          ))}
        </select>
        <p id={`${id}-note`} aria-live="polite" className="text-xs text-red-700">
          {errors?.join(' ')}
        </p>
      </div>
      {stage && value ? <StageSelect {...stage} /> : null}
      {grade && value ? (
        <GradeRuleSelect {...grade} rules={options.find((o) => o.slug === value)?.grades ?? []} />
      ) : null}
    </div>
  );
}
