import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { revokeInvitation } from '@/lib/data/invitation-admin';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** Revoke an open invitation: admins any, editors the buyer invitations they sent. No body. */
export const DELETE = handle(async (_request, context: Context) => {
  const actor = await requireActor('invitations:create-buyer');
  const id = parseId((await context.params).id);
  return NextResponse.json({ invitation: await revokeInvitation(actor, id) });
});
