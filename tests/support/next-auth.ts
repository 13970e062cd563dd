import { expect } from 'vitest';
import { NextRequest } from 'next/server';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';
import * as me from '@/app/api/me/route';
import proxy from '@/proxy';
import { DEMO_PASSWORD } from './accounts';
import { setRequestHeaders } from './request';

const BASE = 'http://tenderline.test/api/auth';
const context = (...segments: string[]) => ({ params: Promise.resolve({ nextauth: segments }) });

/** `name=value` pairs of every Set-Cookie of a response, joined for a Cookie header. */
export function cookiesOf(response: Response): string {
  return response.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

/** A CSRF token and its cookie, fetched from next-auth like the sign-in page does. */
export async function csrf(): Promise<{ token: string; cookie: string }> {
  setRequestHeaders();
  const response = await nextauth.GET(new NextRequest(`${BASE}/csrf`), context('csrf'));
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return { token: csrfToken, cookie: cookiesOf(response) };
}

/** POST the credentials form as the browser's sign-in would, from a given client address. */
export async function postCredentials(
  email: string,
  password: string,
  session: { token: string; cookie: string },
  address = '127.0.0.1',
): Promise<Response> {
  const headers = {
    'content-type': 'application/x-www-form-urlencoded',
    cookie: session.cookie,
    'x-forwarded-for': address,
  };
  setRequestHeaders(headers);
  const body = new URLSearchParams({ email, password, csrfToken: session.token, json: 'true' });
  const request = new NextRequest(`${BASE}/callback/credentials`, {
    method: 'POST',
    headers,
    body,
  });
  return nextauth.POST(request, context('callback', 'credentials'));
}

export async function getNextAuth(path: string, cookie = ''): Promise<Response> {
  setRequestHeaders(cookie ? { cookie } : {});
  const request = new NextRequest(`${BASE}/${path}`, { headers: cookie ? { cookie } : {} });
  return nextauth.GET(request, context(...path.split('/')));
}

// The real session, cookie to database, for the session tests (no readSession mock).

export const ORIGIN = 'http://tenderline.test';
export const SESSION_COOKIE = 'next-auth.session-token';

/** Sign in for real and return the cookie header a browser would send afterwards. */
export async function signIn(email: string, pass = DEMO_PASSWORD): Promise<string> {
  const session = await csrf();
  const response = await postCredentials(email, pass, session);
  expect(response.status).toBe(200);
  return `${session.cookie}; ${cookiesOf(response)}`;
}

/** The session token inside a cookie header. */
export function tokenOf(cookie: string): string {
  const pair = cookie.split('; ').find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  return pair!.slice(SESSION_COOKIE.length + 1);
}

/** /api/me with this cookie: a route handler reading the session. */
export async function meStatus(cookie: string): Promise<number> {
  setRequestHeaders({ cookie });
  return (await me.GET(new Request(`${ORIGIN}/api/me`, { headers: { cookie } }), {})).status;
}

/** next-auth's session endpoint with this cookie. */
export async function sessionBody(cookie: string): Promise<Record<string, unknown>> {
  return (await (await getNextAuth('session', cookie)).json()) as Record<string, unknown>;
}

/** proxy.ts in front of a page: 200 lets the visitor through, 307 sends them to sign-in. */
export async function proxyPage(cookie: string, path = '/account'): Promise<Response> {
  return proxy(new NextRequest(`${ORIGIN}${path}`, { headers: { cookie } }));
}
