import type { InputHTMLAttributes } from 'react';
import { FieldFrame } from './field-frame';

/** A labelled input with its error messages announced next to it. */
export function Field({
  label,
  name,
  errors,
  hint,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  name: string;
  errors?: string[];
  hint?: string;
}) {
  return (
    <FieldFrame id={name} label={label} errors={errors} hint={hint}>
      {(control) => (
        <input
          {...control}
          name={name}
          className="block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
          {...input}
        />
      )}
    </FieldFrame>
  );
}
