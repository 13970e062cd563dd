import type { ReactNode, SelectHTMLAttributes } from 'react';

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
  const errorId = `${name}-error`;
  const hintId = hint ? `${name}-hint` : undefined;
  return (
    <div className="min-w-0 space-y-1">
      <label htmlFor={name} className="block text-sm font-medium text-stone-800">
        {label}
      </label>
      <select
        id={name}
        name={name}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={
          [errors?.length ? errorId : null, hintId].filter(Boolean).join(' ') || undefined
        }
        className="block w-full min-w-0 rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
        {...select}
      >
        {children}
      </select>
      {hint ? (
        <p id={hintId} className="text-xs text-stone-500">
          {hint}
        </p>
      ) : null}
      <p id={errorId} aria-live="polite" className="text-xs text-red-700">
        {errors?.join(' ')}
      </p>
    </div>
  );
}
