'use server';

import { revalidatePath } from 'next/cache';
import { requireActor } from '@/lib/auth/session';
import { clearSignInLock, updateUser } from '@/lib/data/users';
import { formObject } from '@/lib/validation/form';
import { parseInput } from '@/lib/validation/parse';
import { userIdFormSchema, userUpdateFormSchema } from '@/lib/validation/users';
import { runAction, type ActionState } from './state';

/** Admin: change a user's role ("role") or disabled flag ("disabled": "true" | "false"). */
export async function updateUserAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('users:manage');
    const { userId, ...change } = parseInput(userUpdateFormSchema, formObject(form));
    const user = await updateUser(actor, userId, change);
    revalidatePath('/admin/users');
    return `Saved ${user.email}: ${user.role}${user.disabled ? ', disabled' : ''}.`;
  });
}

/** Admin: clear a user's sign-in lock ("userId"). */
export async function clearSignInLockAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('users:manage');
    const { userId } = parseInput(userIdFormSchema, formObject(form));
    const cleared = await clearSignInLock(actor, userId);
    revalidatePath('/admin/users');
    return cleared ? 'Sign-in lock cleared.' : 'There was no sign-in lock to clear.';
  });
}
