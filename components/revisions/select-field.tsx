import type { ReactNode, SelectHTMLAttributes } from 'react';
import { FieldFrame } from '@/components/ui/field-frame';

/** A labelled select with its error messages announced next to it (names may hold dots). */
export function SelectField({
  label,
  name,
  errors,
  hint,
  children,
  ...select
}: SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  name: string;
  errors?: string[];
  hint?: ReactNode;
}) {
  return (
    <FieldFrame id={name} label={label} errors={errors} hint={hint} className="min-w-0 space-y-1">
      {(control) => (
        <select
          {...control}
          name={name}
          className="block w-full min-w-0 rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
          {...select}
        >
          {children}
        </select>
      )}
    </FieldFrame>
  );
}
