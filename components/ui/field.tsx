import type { InputHTMLAttributes } from 'react';

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
  const errorId = `${name}-error`;
  const hintId = hint ? `${name}-hint` : undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={name} className="block text-sm font-medium text-stone-800">
        {label}
      </label>
      <input
        id={name}
        name={name}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={
          [errors?.length ? errorId : null, hintId].filter(Boolean).join(' ') || undefined
        }
        className="block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
        {...input}
      />
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
