import type { InputHTMLAttributes } from 'react';
import { FieldFrame } from '@/components/ui/field-frame';

/** A labelled input of the photo form, with ids of its own (other forms on the page use `file`). */
export function PhotoInput({
  id,
  label,
  errors,
  hint,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & {
  id: string;
  label: string;
  errors?: string[];
  hint?: string;
}) {
  return (
    <FieldFrame id={id} label={label} errors={errors} hint={hint} className="min-w-0 space-y-1">
      {(control) => (
        <input
          {...control}
          className="block w-full min-w-0 rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm file:mr-3 file:rounded file:border-0 file:bg-stone-100 file:px-2 file:py-1 file:text-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
          {...input}
        />
      )}
    </FieldFrame>
  );
}
