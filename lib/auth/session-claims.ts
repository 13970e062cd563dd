import 'server-only';
import { cookies } from 'next/headers';
import { isHttpsApp } from '@/lib/http/origin';
import { decodeSessionToken, encodeSessionToken, SESSION_MAX_AGE } from './session-token';

/** A cookie older than this is re-issued on the next route or action call, seconds. */
const RENEW_AFTER = 3600;

const cookieName = () => `${isHttpsApp() ? '__Secure-' : ''}next-auth.session-token`;
/** A cookie next-auth split into `name.0`, `name.1`, …, joined in order; undefined without one. */
function joinChunks(all: { name: string; value: string }[], name: string): string | undefined {
  const index = (c: { name: string }) => Number(c.name.slice(name.length + 1));
  const chunks = all
    .filter((c) => c.name.startsWith(`${name}.`) && /^\d+$/.test(c.name.slice(name.length + 1)))
    .sort((a, b) => index(a) - index(b));
  return chunks.map((c) => c.value).join('') || undefined;
}

const secret = () => process.env.NEXTAUTH_SECRET ?? process.env.AUTH_SECRET;

/**
 * Who the session cookie says is signed in, for route handlers and server actions: the cookie is
 * next-auth's own JWE (a large one split into `.0`, `.1`, … chunks is joined), decrypted and its
 * expiry checked with the cached-key codec. The caller still checks the account and the session
 * generation against the database (getActiveActor) — this replaces next-auth's session read,
 * which did the same checks plus a second user read and a re-encrypted cookie on every request.
 * The cookie is renewed (sliding expiry, as next-auth does) once it is an hour old.
 */
export async function readSessionClaims(): Promise<{ id: number; generation: number } | null> {
  const store = await cookies();
  const name = cookieName();
  const whole = store.get(name)?.value;
  const raw = whole ?? joinChunks(store.getAll(), name);
  const key = secret();
  if (!raw || !key) return null;
  const token = await decodeSessionToken({ token: raw, secret: key }).catch(() => null);
  const id = Number(token?.sub);
  const generation = Number(token?.gen);
  if (!token || !Number.isInteger(id) || id <= 0 || !Number.isInteger(generation)) return null;
  if (whole && Math.floor(Date.now() / 1000) - Number(token.iat ?? 0) > RENEW_AFTER) {
    const claims = { ...token };
    for (const stamp of ['iat', 'exp', 'jti'] as const) delete claims[stamp];
    const value = await encodeSessionToken({ token: claims, secret: key, maxAge: SESSION_MAX_AGE });
    try {
      store.set(name, value, {
        httpOnly: true,
        sameSite: 'lax',
        path: '/',
        secure: isHttpsApp(),
        expires: new Date(Date.now() + SESSION_MAX_AGE * 1000),
      });
    } catch {
      // Rendering a page cannot set cookies; the next route call renews it.
    }
  }
  return { id, generation };
}
