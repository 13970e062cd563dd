'use client';

import { citation } from './format';
import { SelectField } from './select-field';

export interface SourceChoice {
  key: string;
  authors: string | null;
  year: number | null;
  title: string;
}

const short = (s: string, n: number) => (s.length > n ? `${s.slice(0, n - 1)}…` : s);

/** The source of a value, chosen by key; the full citation of the chosen one is shown below. */
export function SourceSelect({
  name,
  value,
  sources,
  errors,
  onChange,
}: {
  name: string;
  value: string;
  sources: SourceChoice[];
  errors?: string[];
  onChange: (value: string) => void;
}) {
  const chosen = sources.find((s) => s.key === value);
  const known = value === '' || Boolean(chosen);
  return (
    <SelectField
      label="Source"
      name={name}
      value={value}
      errors={errors}
      onChange={(e) => onChange(e.target.value)}
      hint={chosen ? citation(chosen) : 'A value needs a source unless it is a typical default.'}
    >
      <option value="">(no source)</option>
      {known ? null : <option value={value}>{value} (unknown key)</option>}
      {sources.map((s) => (
        <option key={s.key} value={s.key}>
          {short(`${s.key} — ${citation(s)}`, 90)}
        </option>
      ))}
    </SelectField>
  );
}
