'use client';

import Link from 'next/link';
import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { CheckRequestError } from './use-check';

/**
 * Save the check as it stands (a TanStack Query mutation): the server runs it again and keeps it
 * with the data it used.
 */
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
  const save = useMutation({
    mutationFn: async (): Promise<number> => {
      let res: Response;
      try {
        res = await fetch('/api/assessments', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ check, title, notes: notes || undefined, inputs }),
        });
      } catch {
        // No answer at all (offline, server gone): say so, and let them try again.
        throw new CheckRequestError(
          'The server could not be reached: nothing was saved. Try again.',
        );
      }
      const json = await res.json().catch(() => ({}));
      if (!res.ok) throw new CheckRequestError(json.message ?? 'Could not save.', json.fieldErrors);
      return json.assessment.id;
    },
  });
  const error = save.error instanceof CheckRequestError ? save.error : null;
  return (
    <form
      className="space-y-2 rounded-lg border border-stone-200 bg-white p-3"
      data-testid="save-assessment"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
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
        {save.data ? (
          <Link href={`/assessments/${save.data}`} className="text-leaf-700 underline">
            Saved: open the report
          </Link>
        ) : error ? (
          <span className="text-red-700">
            {[error.message, ...Object.values(error.fieldErrors).flat()].join(' ')}
          </span>
        ) : null}
      </p>
      <Button type="submit" variant="secondary" disabled={disabled || save.isPending}>
        {save.isPending ? 'Saving…' : 'Save assessment'}
      </Button>
    </form>
  );
}
