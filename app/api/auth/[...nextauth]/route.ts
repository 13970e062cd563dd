import NextAuth from 'next-auth';
import { authOptions, SIGN_IN_ERRORS } from '@/auth';
import { lockedForMs, throttleKey } from '@/lib/auth/throttle';

const handler = NextAuth(authOptions);

type Context = { params: Promise<{ nextauth: string[] }> };

/** Refuse a locked-out e-mail with 429 before next-auth sees the attempt. */
async function POST(request: Request, context: Context) {
  const { nextauth } = await context.params;
  if (nextauth[0] === 'callback' && nextauth[1] === 'credentials') {
    const form = await request
      .clone()
      .formData()
      .catch(() => null);
    const email = form?.get('email');
    if (typeof email === 'string' && email) {
      const wait = await lockedForMs(throttleKey(email));
      if (wait > 0) {
        const url = new URL('/sign-in?error=RateLimited', request.url).toString();
        return Response.json(
          { error: 'RateLimited', message: SIGN_IN_ERRORS.RateLimited, url },
          { status: 429, headers: { 'Retry-After': String(Math.ceil(wait / 1000)) } },
        );
      }
    }
  }
  return handler(request, context);
}

export { handler as GET, POST };
