import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { handle } from '@/lib/http/handler';
import { areasFor } from '@/lib/navigation';

/** The signed-in user and the areas their role may enter. */
export const GET = handle(async () => {
  const actor = await requireActor('account:manage-own');
  return NextResponse.json({ user: actor, areas: areasFor(actor.role).map((a) => a.href) });
});
