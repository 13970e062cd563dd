import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { updateUser } from '@/lib/data/users';
import { handle, readJson } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** Change a user's role and/or disabled flag: { role?, disabled? }. */
export const PATCH = handle(async (request, context: Context) => {
  const actor = await requireActor('users:manage');
  const id = parseId((await context.params).id);
  return NextResponse.json({ user: await updateUser(actor, id, await readJson(request)) });
});
