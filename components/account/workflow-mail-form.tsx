'use client';

import { useActionState } from 'react';
import { setWorkflowMailAction } from '@/lib/actions/workflow-mail';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** E-mails of the revision workflow: submitted for review (to reviewers), published or returned. */
export function WorkflowMailForm({ current }: { current: boolean }) {
  const [state, action, pending] = useActionState(setWorkflowMailAction, initialActionState);
  return (
    <form action={action} className="max-w-xl space-y-3" data-testid="workflow-mail-form">
      <fieldset className="space-y-1 text-sm">
        <legend className="mb-1 text-stone-700">
          A revision submitted for your review, and your own revisions published or returned, with
          figures in your display units.
        </legend>
        <label className="flex items-center gap-2">
          <input type="radio" name="workflowMail" value="on" defaultChecked={current} /> E-mail me
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name="workflowMail" value="off" defaultChecked={!current} /> Mute
          these e-mails
        </label>
      </fieldset>
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? 'Saving…' : 'Save e-mail choice'}
      </Button>
    </form>
  );
}
