import type { ReactNode } from 'react';

/** What a control inside a FieldFrame spreads on itself to be labelled and described. */
export interface ControlProps {
  id: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
}

/**
 * A label, a control, its hint and its error messages announced next to it: the one frame of
 * every form field (input, select, file), so they all describe themselves the same way.
 */
export function FieldFrame({
  id,
  label,
  errors,
  hint,
  className = 'space-y-1',
  children,
}: {
  id: string;
  label: string;
  errors?: string[];
  hint?: ReactNode;
  className?: string;
  children: (control: ControlProps) => ReactNode;
}) {
  const errorId = `${id}-error`;
  const hintId = hint ? `${id}-hint` : undefined;
  const control: ControlProps = {
    id,
    'aria-invalid': errors?.length ? true : undefined,
    'aria-describedby':
      [errors?.length ? errorId : null, hintId].filter(Boolean).join(' ') || undefined,
  };
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-sm font-medium text-stone-800">
        {label}
      </label>
      {children(control)}
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
