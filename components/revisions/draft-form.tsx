'use client';

import { startTransition, useActionState, useRef, useState, type FormEvent } from 'react';
import { updateDraftAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';
import type { ActionState } from '@/lib/actions/state';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import {
  emptyValueFields,
  type ValueField,
  type ValueFields,
} from '@/lib/validation/revision-form';
import type { DiffValue } from '@/lib/properties/diff';
import { ErrorSummary } from './error-summary';
import { LiveDiff } from './live-diff';
import type { SourceChoice } from './source-select';
import { ValueRow } from './value-row';

interface Row {
  key: number;
  fields: ValueFields;
}

/**
 * The author's form for a draft or returned revision. Every field is held in state, and the
 * form is sent from onSubmit (not the action prop), so nothing typed is reset by a save —
 * after an error every field still shows what was typed, with its message beside it.
 */
export function DraftForm({
  revisionId,
  summary: initialSummary,
  values,
  sources,
  published,
}: {
  revisionId: number;
  summary: string;
  values: ValueFields[];
  sources: SourceChoice[];
  /** The newest published revision, for the live comparison below the form. */
  published: { label: string; values: DiffValue[] };
}) {
  const [state, action, pending] = useActionState(updateDraftAction, initialActionState);
  const nextKey = useRef(values.length);
  const [rows, setRows] = useState<Row[]>(() => values.map((fields, key) => ({ key, fields })));
  const [summary, setSummary] = useState(initialSummary);
  // Row messages belong to the rows as they were sent; adding or removing one hides them.
  const [reshapedAt, setReshapedAt] = useState<ActionState | null>(null);
  const errors = state.fieldErrors ?? {};
  const rowErrors = reshapedAt === state ? {} : errors;

  const update = (index: number, field: ValueField, value: string) =>
    setRows((prev) =>
      prev.map((r, i) => (i === index ? { ...r, fields: { ...r.fields, [field]: value } } : r)),
    );
  const add = () => {
    setRows((prev) => [...prev, { key: nextKey.current++, fields: emptyValueFields() }]);
    setReshapedAt(state);
  };
  const remove = (index: number) => {
    setRows((prev) => prev.filter((_, i) => i !== index));
    setReshapedAt(state);
  };
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const submitter = (event.nativeEvent as SubmitEvent).submitter;
    const form = new FormData(event.currentTarget, submitter);
    startTransition(() => action(form));
  };

  return (
    <>
      <form onSubmit={submit} className="space-y-4" data-testid="draft-form" noValidate>
        <input type="hidden" name="revisionId" value={revisionId} />
        <div className="space-y-1">
          <label htmlFor="summary" className="block text-sm font-medium text-stone-800">
            What this revision changes
          </label>
          <textarea
            id="summary"
            name="summary"
            rows={2}
            maxLength={500}
            value={summary}
            onChange={(e) => setSummary(e.target.value)}
            aria-invalid={errors.summary ? true : undefined}
            aria-describedby={errors.summary ? 'summary-error' : undefined}
            className="block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600"
          />
          <p id="summary-error" aria-live="polite" className="text-xs text-red-700">
            {errors.summary?.join(' ')}
          </p>
        </div>
        {rows.map((row, i) => (
          <ValueRow
            key={row.key}
            index={i}
            fields={row.fields}
            errors={rowErrors}
            sources={sources}
            onChange={(field, value) => update(i, field, value)}
            onRemove={() => remove(i)}
          />
        ))}
        <div className="space-y-1">
          <Button type="button" variant="secondary" onClick={add}>
            Add a value
          </Button>
          <p aria-live="polite" className="text-xs text-red-700" data-testid="values-error">
            {errors.values?.join(' ')}
          </p>
        </div>
        <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
        <ErrorSummary errors={rowErrors} />
        <div className="flex flex-wrap gap-3">
          <Button type="submit" name="intent" value="save" disabled={pending}>
            {pending ? 'Saving…' : 'Save'}
          </Button>
          <Button type="submit" name="intent" value="submit" variant="secondary" disabled={pending}>
            Save and submit for review
          </Button>
        </div>
      </form>
      <div className="mt-6">
        <LiveDiff
          rows={rows.map((r) => r.fields)}
          published={published.values}
          label={published.label}
        />
      </div>
    </>
  );
}
