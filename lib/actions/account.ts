'use server';

import { requireActor } from '@/lib/auth/session';
import { changeOwnPassword } from '@/lib/data/users';
import { formObject } from '@/lib/validation/form';
import { runAction, type ActionState } from './state';

export async function changePasswordAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('account:manage-own');
    await changeOwnPassword(actor, formObject(form));
    return 'Your password has been changed.';
  });
}
