import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { changeOwnPassword } from '@/lib/data/users';
import { handle, readJson } from '@/lib/http/handler';

export const POST = handle(async (request) => {
  const actor = await requireActor('account:manage-own');
  await changeOwnPassword(actor, await readJson(request));
  return NextResponse.json({ ok: true });
});
