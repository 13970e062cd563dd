import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listOpenInvitations } from '@/lib/data/invitation-admin';
import { createInvitation } from '@/lib/data/invitations';
import { handle, readJson } from '@/lib/http/handler';

/** Open invitations the caller may revoke or resend (admins: all; editors: their own). */
export const GET = handle(async () => {
  const actor = await requireActor('invitations:create-buyer');
  return NextResponse.json({ invitations: await listOpenInvitations(actor) });
});

/**
 * Invite by e-mail: { email, role? } (role defaults to buyer; editors may invite buyers only).
 * An open invitation to the same address is replaced; 20 invitations per inviter an hour (429).
 */
export const POST = handle(async (request) => {
  const actor = await requireActor('invitations:create-buyer');
  const invitation = await createInvitation(actor, await readJson(request));
  return NextResponse.json({ invitation }, { status: 201 });
});
