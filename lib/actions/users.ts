'use server';

import { revalidatePath } from 'next/cache';
import { requireActor } from '@/lib/auth/session';
import { updateUser } from '@/lib/data/users';
import { parseId } from '@/lib/http/handler';
import { formObject, runAction, type ActionState } from './state';

/** Admin: change a user's role ("role") or disabled flag ("disabled": "true" | "false"). */
export async function updateUserAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('users:manage');
    const { userId, role, disabled } = formObject(form);
    const id = parseId(userId ?? '', 'userId');
    const change: Record<string, unknown> = {};
    if (role !== undefined) change.role = role;
    if (disabled !== undefined)
      change.disabled = disabled === 'true' ? true : disabled === 'false' ? false : disabled;
    const user = await updateUser(actor, id, change);
    revalidatePath('/admin/users');
    return `Saved ${user.email}: ${user.role}${user.disabled ? ', disabled' : ''}.`;
  });
}
