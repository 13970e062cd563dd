import { NextResponse } from 'next/server';
import { acceptInvitation } from '@/lib/data/invitations';
import { handle, readJson } from '@/lib/http/handler';

/**
 * Public: spend an invitation token, creating the account. { token, name, password,
 * confirmPassword }. A missing token is "required", a malformed or unknown one "not valid"
 * (400); a used, revoked, replaced or expired one is 410.
 */
export const POST = handle(async (request) => {
  const body = await readJson(request);
  const token =
    typeof body === 'object' && body !== null ? (body as { token?: unknown }).token : undefined;
  const result = await acceptInvitation(token, body);
  return NextResponse.json({ user: { id: result.userId, email: result.email } }, { status: 201 });
});
