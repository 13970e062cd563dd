import 'server-only';
import { cookies } from 'next/headers';
import type { Actor } from './actor';
import { findSession, sessionCookieName, sessionCookieOptions } from './session-store';

/** The cookies of the request being answered, and a way to set one on its answer. */
export interface SessionCookies {
  get(name: string): { value: string } | undefined;
  set(
    name: string,
    value: string,
    options: ReturnType<typeof sessionCookieOptions> & { expires: Date },
  ): unknown;
}

export interface Session {
  user: Actor;
  expires: Date;
}

/**
 * THE session read: pages, route handlers, server actions, /api/auth/session and proxy.ts all come
 * through here, so they agree on who is signed in. The cookie's token is looked up in the
 * sessions table with its user (lib/auth/session-store.ts); a renewed session re-sends the cookie
 * with its new expiry. Outside a request (proxy.ts) the caller passes the request's cookies.
 */
export async function readSession(jar?: SessionCookies): Promise<Session | null> {
  const store: SessionCookies = jar ?? (await cookies());
  const name = sessionCookieName();
  const token = store.get(name)?.value;
  if (!token) return null;
  const found = await findSession(token);
  if (!found) return null;
  if (found.renewed) {
    try {
      store.set(name, token, { ...sessionCookieOptions(), expires: found.expires });
    } catch {
      // A page render cannot set cookies; proxy.ts, in front of every page, already renewed it.
    }
  }
  return { user: found.user, expires: found.expires };
}
