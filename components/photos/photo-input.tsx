import type { InputHTMLAttributes } from 'react';

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
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div className="min-w-0 space-y-1">
      <label htmlFor={id} className="block text-sm font-medium text-stone-800">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={
          [errors?.length ? errorId : null, hint ? hintId : null].filter(Boolean).join(' ') ||
          undefined
        }
        className="block w-full min-w-0 rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm file:mr-3 file:rounded file:border-0 file:bg-stone-100 file:px-2 file:py-1 file:text-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
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
