import NextAuth from 'next-auth';
import { NextRequest } from 'next/server';
import { authOptions } from '@/auth';
import { readSession } from '@/lib/auth/read-session';
import { signInContext, type SignInContext } from '@/lib/auth/sign-in-context';
import { signInMessage } from '@/lib/auth/sign-in-messages';
import { errorResponse } from '@/lib/http/handler';
import { readText } from '@/lib/http/body';
import { crossSiteMessage, crossSiteReason } from '@/lib/http/origin';
import { AppError, ForbiddenError, RateLimitError, UnsupportedMediaTypeError } from '@/lib/errors';
import { errorPayload } from '@/lib/http/error-map';

const handler = NextAuth(authOptions);
type Context = { params: Promise<{ nextauth: string[] }> };

const FORM = 'application/x-www-form-urlencoded';
const FORM_BODY_LIMIT = 16 * 1024;
const POST_ONLY = new Set(['callback/credentials', 'signout']);

function noStore(response: Response): Response {
  response.headers.set('Cache-Control', 'no-store');
  return response;
}

/**
 * next-auth's session endpoint, answered by the app's one session read so it agrees with every
 * page and route: `{}` when signed out, as next-auth's client expects.
 */
async function sessionAnswer(): Promise<Response> {
  const session = await readSession();
  if (!session) return noStore(Response.json({}));
  const { id, email, name, role } = session.user;
  const user = { id: String(id), email, name, role };
  return noStore(Response.json({ user, expires: session.expires.toISOString() }));
}

/** Odd requests get a 4xx with a plain message before next-auth sees them. */
async function GET(request: NextRequest, context: Context) {
  const action = (await context.params).nextauth.join('/');
  if (action === 'session') return sessionAnswer();
  if (POST_ONLY.has(action)) {
    const error = new AppError(
      405,
      'method_not_allowed',
      'Send this as a POST from the sign-in form.',
    );
    const response = errorResponse(error);
    response.headers.set('Allow', 'POST');
    return response;
  }
  return noStore(await handler(request, context));
}

/**
 * Sign-in, sign-out and the rest of next-auth's POSTs: from the app's own pages only, as a small
 * form body. The attempt is limited inside authorize(); a refusal comes back here as a 429.
 */
async function POST(request: NextRequest, context: Context) {
  try {
    // next-auth's client posts here only to update a session, which the app does not do.
    if ((await context.params).nextauth.join('/') === 'session') return sessionAnswer();
    const reason = crossSiteReason(request.headers);
    if (reason) throw new ForbiddenError(crossSiteMessage(reason));
    const type = request.headers.get('content-type')?.split(';')[0].trim().toLowerCase();
    if (type !== FORM) throw new UnsupportedMediaTypeError([FORM]);
    const body = await readText(request, FORM_BODY_LIMIT);
    const forwarded = new NextRequest(request.url, {
      method: 'POST',
      headers: request.headers,
      body,
    });
    const state: SignInContext = {};
    const response = await signInContext.run(state, () => handler(forwarded, context));
    if (state.limitedForMs === undefined) return noStore(response);
    // The one error map gives status and Retry-After; next-auth's client also needs `url`,
    // whose `error` code the sign-in page turns back into the same message.
    const seconds = Math.max(1, Math.ceil(state.limitedForMs / 1000));
    const p = errorPayload(new RateLimitError(signInMessage('RateLimited'), seconds));
    const url = new URL('/sign-in?error=RateLimited', request.url).toString();
    return noStore(
      Response.json(
        { error: p.code, message: p.message, url },
        { status: p.status, headers: p.headers },
      ),
    );
  } catch (error) {
    return errorResponse(error);
  }
}

export { GET, POST };
