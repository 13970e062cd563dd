'use server';

import { revalidatePath } from 'next/cache';
import { requireActor } from '@/lib/auth/session';
import { updateUser } from '@/lib/data/users';
import { formObject } from '@/lib/validation/form';
import { parseInput } from '@/lib/validation/parse';
import { userUpdateFormSchema } from '@/lib/validation/users';
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
