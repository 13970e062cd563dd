import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { createInvitation } from '@/lib/data/invitations';
import { handle, readJson } from '@/lib/http/handler';

/** Invite by e-mail: { email, role? } (role defaults to buyer; editors may invite buyers only). */
export const POST = handle(async (request) => {
  const actor = await requireActor('invitations:create-buyer');
  const invitation = await createInvitation(actor, await readJson(request));
  return NextResponse.json({ invitation }, { status: 201 });
});
