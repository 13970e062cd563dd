import type { FieldErrors } from '@/lib/errors';
import { VALUE_FIELDS, type ValueField } from '@/lib/validation/revision-form';
import { FIELD_LABELS } from './field-labels';

const ROW_FIELD = /^values\.(\d+)\.(\w+)$/;

function placeOf(key: string): string | null {
  const m = ROW_FIELD.exec(key);
  if (!m || !(VALUE_FIELDS as readonly string[]).includes(m[2])) return null;
  return `Value ${Number(m[1]) + 1}, ${FIELD_LABELS[m[2] as ValueField].toLowerCase()}`;
}

/** Every row's messages in one list near the buttons, each linking to its field. */
export function ErrorSummary({ errors }: { errors: FieldErrors }) {
  const items = Object.entries(errors).flatMap(([key, messages]) => {
    const place = placeOf(key);
    return place ? [{ key, place, text: messages.join(' ') }] : [];
  });
  if (!items.length) return null;
  return (
    <ul className="space-y-1 text-sm text-red-800" data-testid="error-summary">
      {items.map((i) => (
        <li key={i.key}>
          <a href={`#${i.key}`} className="underline underline-offset-2">
            {i.place}
          </a>
          : {i.text}
        </li>
      ))}
    </ul>
  );
}
