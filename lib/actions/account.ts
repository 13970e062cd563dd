'use server';

import { requireActor } from '@/lib/auth/session';
import { changeOwnPassword, endAllSessions } from '@/lib/data/users';
import { formObject } from '@/lib/validation/form';
import { runAction, type ActionState } from './state';

export async function changePasswordAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('account:manage-own');
    await changeOwnPassword(actor, formObject(form));
    return 'Your password has been changed and every session has ended. Sign in again with the new password.';
  });
}

/** End this user's sessions on every device, this one included. */
export async function signOutEverywhereAction(_prev: ActionState): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('account:manage-own');
    await endAllSessions(actor.id, 'sign-out-everywhere');
    return 'Signed out on every device. Sign in again to continue.';
  });
}
