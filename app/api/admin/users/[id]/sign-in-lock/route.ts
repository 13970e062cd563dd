import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { clearSignInLock } from '@/lib/data/users';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** Clear the user's sign-in lock: every per-address count and the account-wide count. */
export const DELETE = handle(async (_request, context: Context) => {
  const actor = await requireActor('users:manage');
  const id = parseId((await context.params).id);
  return NextResponse.json({ cleared: await clearSignInLock(actor, id) });
});
