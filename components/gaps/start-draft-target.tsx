'use client';

import { useActionState } from 'react';
import { FormMessage } from '@/components/ui/form-message';
import { createDraftAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';

export const START_DRAFT_FORM = 'gaps-start-draft';

/**
 * The one form every "start a draft" cell of the matrix submits (by its `form` attribute, with
 * the record's slug as the button's value): the editor's own start-a-draft action, which opens
 * the new draft.
 */
export function StartDraftTarget() {
  const [state, action, pending] = useActionState(createDraftAction, initialActionState);
  return (
    <form id={START_DRAFT_FORM} action={action} aria-busy={pending}>
      <FormMessage tone="error" message={state.ok ? undefined : state.message} />
      {pending ? (
        <p className="text-sm text-stone-600" aria-live="polite">
          Starting a draft…
        </p>
      ) : null}
    </form>
  );
}
