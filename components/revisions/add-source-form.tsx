'use client';

import { useActionState } from 'react';
import { createSourceAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';
import { SOURCE_KIND_LABELS } from '@/lib/properties/citation';
import { EDITOR_SOURCE_KINDS } from '@/lib/validation/sources';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { SelectField } from './select-field';

const TEXT: [name: string, label: string, hint?: string][] = [
  ['key', 'Key', 'How values cite it: lower-case words and dashes, e.g. smith-2024-pear-bruising'],
  ['title', 'Title'],
  ['authors', 'Authors'],
  ['year', 'Year'],
  ['venue', 'Journal, publisher or institution'],
  ['pages', 'Pages'],
  ['doi', 'DOI'],
  ['url', 'Web address'],
  ['note', 'How it was read', 'e.g. full text, abstract only, quoted by another work'],
];

/**
 * A source that is not in the list yet: added here (checked and audited on the server), it can
 * then be chosen in any value's Source list. Typed fields stay after an error.
 */
export function AddSourceForm({ revisionId }: { revisionId: number }) {
  const [state, action, pending] = useActionState(createSourceAction, initialActionState);
  const errors = state.fieldErrors ?? {};
  const typed = state.values ?? {};
  return (
    <details className="rounded-lg border border-stone-200 bg-white p-3" data-testid="add-source">
      <summary className="cursor-pointer text-sm font-medium">
        A source that is not in the list? Add it
      </summary>
      <form action={action} className="mt-3 grid gap-3 sm:grid-cols-2" noValidate>
        <input type="hidden" name="revisionId" value={revisionId} />
        <SelectField
          key={`kind:${typed.kind ?? ''}`}
          label="Kind of work"
          name="kind"
          defaultValue={typed.kind ?? ''}
          errors={errors.kind}
        >
          <option value="">(choose)</option>
          {EDITOR_SOURCE_KINDS.map((k) => (
            <option key={k} value={k}>
              {SOURCE_KIND_LABELS[k]}
            </option>
          ))}
        </SelectField>
        {TEXT.map(([name, label, hint]) => (
          <Field
            key={`${name}:${typed[name] ?? ''}`}
            label={label}
            name={name}
            hint={hint}
            defaultValue={typed[name] ?? ''}
            errors={errors[name]}
            inputMode={name === 'year' ? 'numeric' : undefined}
          />
        ))}
        <div className="space-y-2 sm:col-span-2">
          <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
          <Button type="submit" variant="secondary" disabled={pending}>
            {pending ? 'Adding…' : 'Add the source'}
          </Button>
        </div>
      </form>
    </details>
  );
}
