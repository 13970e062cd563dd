'use client';

import { useActionState } from 'react';
import { rebaseDraftAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** The author's way out of a stale base: move the draft onto the published revision. */
export function RebaseForm({ revisionId, target }: { revisionId: number; target: string }) {
  const [state, action, pending] = useActionState(rebaseDraftAction, initialActionState);
  return (
    <form action={action} className="mt-3 space-y-2">
      <input type="hidden" name="revisionId" value={revisionId} />
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? 'Rebasing…' : `Rebase on ${target}`}
      </Button>
    </form>
  );
}
