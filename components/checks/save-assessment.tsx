'use client';

import Link from 'next/link';
import { useState } from 'react';
import { Button } from '@/components/ui/button';

/** Save the check as it stands: the server runs it again and keeps it with the data it used. */
export function SaveAssessment({
  check,
  inputs,
  disabled,
}: {
  check: string;
  inputs: Record<string, unknown>;
  disabled: boolean;
}) {
  const [title, setTitle] = useState('');
  const [notes, setNotes] = useState('');
  const [state, setState] = useState<{
    pending?: boolean;
    id?: number;
    error?: string;
    fieldErrors?: Record<string, string[]>;
  }>({});
  async function save() {
    setState({ pending: true });
    try {
      const res = await fetch('/api/assessments', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ check, title, notes: notes || undefined, inputs }),
      });
      const json = await res.json().catch(() => ({}));
      setState(
        res.ok
          ? { id: json.assessment.id }
          : { error: json.message ?? 'Could not save.', fieldErrors: json.fieldErrors },
      );
    } catch {
      // The request never got an answer (offline, server gone): say so and let them try again.
      setState({ error: 'The server could not be reached: nothing was saved. Try again.' });
    }
  }
  return (
    <form
      className="space-y-2 rounded-lg border border-stone-200 bg-white p-3"
      data-testid="save-assessment"
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
    >
      <p className="text-sm font-medium">Save as an assessment</p>
      <label className="block text-sm">
        Title
        <input
          value={title}
          onChange={(e) => setTitle(e.target.value)}
          maxLength={200}
          className="mt-1 block w-full rounded-md border border-stone-300 px-2 py-1"
          aria-describedby="save-assessment-note"
        />
      </label>
      <label className="block text-sm">
        Notes
        <textarea
          value={notes}
          onChange={(e) => setNotes(e.target.value)}
          maxLength={5000}
          rows={2}
          className="mt-1 block w-full rounded-md border border-stone-300 px-2 py-1"
        />
      </label>
      <p id="save-assessment-note" aria-live="polite" className="text-sm">
        {state.id ? (
          <Link href={`/assessments/${state.id}`} className="text-leaf-700 underline">
            Saved: open the report
          </Link>
        ) : state.error ? (
          <span className="text-red-700">
            {[state.error, ...Object.values(state.fieldErrors ?? {}).flat()].join(' ')}
          </span>
        ) : null}
      </p>
      <Button type="submit" variant="secondary" disabled={disabled || state.pending}>
        {state.pending ? 'Saving…' : 'Save assessment'}
      </Button>
    </form>
  );
}
