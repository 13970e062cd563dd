'use server';

import { requireActor } from '@/lib/auth/session';
import { acceptInvitation, createInvitation } from '@/lib/data/invitations';
import { formObject } from '@/lib/validation/form';
import { runAction, type ActionState } from './state';

export async function inviteAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('invitations:create-buyer');
    const invitation = await createInvitation(actor, formObject(form));
    return `Invitation e-mailed to ${invitation.email}; the link works once for 7 days.`;
  });
}

/** Public: the invitation link's form. The token travels in a hidden field. */
export async function acceptInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const values = formObject(form);
    const result = await acceptInvitation(values.token ?? '', values);
    return `Your account ${result.email} is ready. Sign in with your new password.`;
  });
}
