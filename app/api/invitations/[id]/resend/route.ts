import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { resendInvitation } from '@/lib/data/invitation-admin';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/**
 * E-mail an invitation again with a new link (the old one then says it was replaced). The body,
 * sent as JSON, is ignored. Same rights as revoking; counts towards the hourly limit.
 */
export const POST = handle(async (_request, context: Context) => {
  const actor = await requireActor('invitations:create-buyer');
  const id = parseId((await context.params).id);
  return NextResponse.json({ invitation: await resendInvitation(actor, id) }, { status: 201 });
});
