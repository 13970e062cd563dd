'use server';

import { revalidatePath } from 'next/cache';
import { requireActor } from '@/lib/auth/session';
import { setWorkflowMail } from '@/lib/data/revision-mail-setting';
import { formObject } from '@/lib/validation/form';
import { runAction, type ActionState } from './state';

/** Turn one's own revision workflow e-mails on or off ("workflowMail": "on" | "off"). */
export async function setWorkflowMailAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('account:manage-own');
    const on = await setWorkflowMail(actor, formObject(form));
    revalidatePath('/account');
    return on
      ? 'You will be e-mailed when revisions are submitted for review, published or returned.'
      : 'Workflow e-mails are muted.';
  });
}
