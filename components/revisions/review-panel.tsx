'use client';

import { useActionState } from 'react';
import { publishRevisionAction, returnRevisionAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** Another editor's decision on a revision in review: publish it, or return it with a comment. */
export function ReviewPanel({ revisionId }: { revisionId: number }) {
  const [published, publish, publishing] = useActionState(
    publishRevisionAction,
    initialActionState,
  );
  const [returned, giveBack, returning] = useActionState(returnRevisionAction, initialActionState);
  const commentErrors = returned.fieldErrors?.comment;
  return (
    <div className="grid gap-4 md:grid-cols-2" data-testid="review-panel">
      <form action={publish} className="space-y-3 rounded-lg border border-stone-200 bg-white p-4">
        <h2 className="font-semibold">Publish</h2>
        <p className="text-sm text-stone-600">
          The values below become the cultivar&apos;s published record; the current one is kept as
          superseded, and followers are e-mailed what changed.
        </p>
        <input type="hidden" name="revisionId" value={revisionId} />
        <FormMessage tone={published.ok ? 'success' : 'error'} message={published.message} />
        <Button type="submit" disabled={publishing || returning}>
          {publishing ? 'Publishing…' : 'Publish'}
        </Button>
      </form>
      <form action={giveBack} className="space-y-3 rounded-lg border border-stone-200 bg-white p-4">
        <h2 className="font-semibold">Return to the author</h2>
        <input type="hidden" name="revisionId" value={revisionId} />
        <div className="space-y-1">
          <label htmlFor="comment" className="block text-sm font-medium text-stone-800">
            What should change (required)
          </label>
          <textarea
            id="comment"
            name="comment"
            rows={3}
            maxLength={2000}
            key={returned.values?.comment ?? ''}
            defaultValue={returned.values?.comment}
            aria-invalid={commentErrors ? true : undefined}
            aria-describedby={commentErrors ? 'comment-error' : undefined}
            className="block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500"
          />
          <p id="comment-error" aria-live="polite" className="text-xs text-red-700">
            {commentErrors?.join(' ')}
          </p>
        </div>
        <FormMessage tone={returned.ok ? 'success' : 'error'} message={returned.message} />
        <Button type="submit" variant="danger" disabled={publishing || returning}>
          {returning ? 'Returning…' : 'Return with comment'}
        </Button>
      </form>
    </div>
  );
}
