import { NextResponse } from 'next/server';
import { getInvitationState } from '@/lib/data/invitations';
import { handle } from '@/lib/http/handler';
import { LINK_COOKIE, linkCookieOptions } from '@/lib/invitations/link-cookie';
import { problemResponse } from '@/lib/invitations/problem-page';

type Context = { params: Promise<{ token: string }> };

/**
 * The link in the invitation e-mail. A working link moves its token into a cookie and sends the
 * browser on to the accept form; an unknown link answers 404 and an ended one (used, revoked,
 * replaced, expired) 410, each with a page that says why.
 */
export const GET = handle(async (request, context: Context) => {
  const { token } = await context.params;
  const invitation = await getInvitationState(token);
  if (invitation.state !== 'valid')
    return problemResponse(invitation.state, request.headers.get('x-nonce'));
  const response = new NextResponse(null, { status: 303, headers: { Location: '/invite/accept' } });
  response.cookies.set(LINK_COOKIE, token, linkCookieOptions());
  return response;
});
