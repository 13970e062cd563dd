import { NextRequest } from 'next/server';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';
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
