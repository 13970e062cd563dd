import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listUsers } from '@/lib/data/users';
import { handle } from '@/lib/http/handler';

export const GET = handle(async () => {
  const actor = await requireActor('users:manage');
  return NextResponse.json({ users: await listUsers(actor) });
});
