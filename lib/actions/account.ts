'use server';

import { requireActor } from '@/lib/auth/session';
import { revalidatePath } from 'next/cache';
import { changeOwnPassword, endAllSessions, setUnitSystem } from '@/lib/data/users';
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
export async function signOutEverywhereAction(): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('account:manage-own');
    await endAllSessions(actor.id, 'sign-out-everywhere');
    return 'Signed out on every device. Sign in again to continue.';
  });
}

/** Choose display units ("unitSystem": "si" | "us"); stored values stay SI. */
export async function setUnitSystemAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('account:manage-own');
    const system = await setUnitSystem(actor, formObject(form));
    revalidatePath('/', 'layout');
    return system === 'us'
      ? 'Values now show in US customary units.'
      : 'Values now show in SI units.';
  });
}
