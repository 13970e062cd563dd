import { NextResponse, type NextRequest } from 'next/server';
import { readSession, type SessionCookies } from '@/lib/auth/read-session';
import { crossSiteMessage, crossSiteReason, isHttpsApp } from '@/lib/http/origin';
import { contentSecurityPolicy, HSTS } from '@/lib/http/security-headers';

/**
 * The first, cheap layer in front of every page and API route:
 * - posts to pages (server actions) from another origin get a plain 403, and a form post that
 *   names no action gets a 400, instead of Next's 500;
 * - signed-out visitors to pages go to /sign-in (API routes answer 401 themselves), by the same
 *   session read as every page, route and action, which also renews the cookie here;
 * - every answer gets a fresh script nonce in its Content-Security-Policy, and HSTS over https.
 * Every page, handler and action still checks the user and role on the server.
 */
const PUBLIC_PAGES = [/^\/sign-in(\/|$)/, /^\/invite\//];
const FORM_TYPES = ['multipart/form-data', 'application/x-www-form-urlencoded'];

function plain(status: number, message: string) {
  return NextResponse.json(
    { error: status === 403 ? 'forbidden' : 'bad_request', message },
    { status, headers: { 'Cache-Control': 'no-store' } },
  );
}

async function pagePostProblem(request: NextRequest): Promise<NextResponse | null> {
  const reason = crossSiteReason(request.headers);
  if (reason) return plain(403, crossSiteMessage(reason));
  if (request.headers.has('next-action')) return null;
  const type = request.headers.get('content-type')?.split(';')[0].trim().toLowerCase() ?? '';
  if (!FORM_TYPES.includes(type)) return plain(400, 'This address does not accept posts.');
  const form = await request
    .clone()
    .formData()
    .catch(() => null);
  const names = form ? [...form.keys()] : [];
  if (!names.some((name) => name.startsWith('$ACTION_'))) {
    return plain(400, 'This form post names no action of this page.');
  }
  return null;
}

export default async function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const isApi = pathname.startsWith('/api/');
  if (!isApi && request.method === 'POST') {
    const problem = await pagePostProblem(request);
    if (problem) return problem;
  }
  const renewed: Parameters<SessionCookies['set']>[] = [];
  if (!isApi && !PUBLIC_PAGES.some((p) => p.test(pathname))) {
    // A page render cannot set cookies, so a renewal is put on this answer instead.
    const jar: SessionCookies = {
      get: (name) => request.cookies.get(name),
      set: (...cookie) => renewed.push(cookie),
    };
    if (!(await readSession(jar))) {
      const signIn = new URL('/sign-in', request.url);
      signIn.searchParams.set('callbackUrl', pathname + request.nextUrl.search);
      return NextResponse.redirect(signIn);
    }
  }
  const nonce = btoa(crypto.randomUUID());
  const https = isHttpsApp();
  const csp = contentSecurityPolicy(nonce, { dev: process.env.NODE_ENV !== 'production', https });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('Content-Security-Policy', csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set('Content-Security-Policy', csp);
  for (const [name, value, options] of renewed) response.cookies.set(name, value, options);
  if (https) response.headers.set('Strict-Transport-Security', HSTS);
  return response;
}

export const config = {
  matcher: ['/((?!_next/static|_next/image|favicon.ico|icon.svg|manifest.webmanifest|fonts/).*)'],
};
