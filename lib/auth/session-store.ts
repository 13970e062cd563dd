import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { db } from '@/lib/db';
import { isHttpsApp } from '@/lib/http/origin';
import type { Actor } from './actor';
import { isRole } from './roles';

/**
 * The session cookie's one codec: the cookie holds a random token, the `sessions` table a row
 * keyed by its SHA-256 (a leaked copy of the table opens nothing). Whether a session is live is
 * decided here alone, against the database, so ending one is deleting its row.
 */

/** How long a session lasts from its last renewal, seconds (one working shift). */
export const SESSION_MAX_AGE = 8 * 3600;
/** A session last renewed longer ago than this is renewed (row and cookie) on its next use. */
export const RENEW_AFTER = 3600;

/** next-auth's cookie name, so its sign-in writes and its sign-out clears the same cookie. */
export const sessionCookieName = () => `${isHttpsApp() ? '__Secure-' : ''}next-auth.session-token`;

/** The cookie's flags, shared with next-auth's sign-in and sign-out (which add the expiry). */
export const sessionCookieOptions = () => ({
  httpOnly: true,
  sameSite: 'lax' as const,
  path: '/',
  secure: isHttpsApp(),
});

const hashOf = (token: string) => createHash('sha256').update(token).digest('hex');

/** A new session for the user; returns the cookie's token (only ever sent to that browser). */
export async function startSession(userId: number): Promise<string> {
  if (!Number.isInteger(userId) || userId <= 0) throw new Error('A session needs a user.');
  const token = randomBytes(32).toString('base64url');
  const now = Date.now();
  await db.transaction(async (trx) => {
    // Signing in is a natural moment to forget this user's sessions that ran out.
    await trx('sessions').where({ user_id: userId }).andWhere('expires_ms', '<=', now).delete();
    await trx('sessions').insert({
      id: hashOf(token),
      user_id: userId,
      created_ms: now,
      renewed_ms: now,
      expires_ms: now + SESSION_MAX_AGE * 1000,
    });
  });
  return token;
}

export interface StoredSession {
  user: Actor;
  expires: Date;
  /** true when this use renewed the session: the caller re-sends the cookie with `expires` */
  renewed: boolean;
}

/**
 * The live session of a cookie token with its user read fresh, or null (unknown, ended, expired,
 * or the account disabled). Renews the session once it is RENEW_AFTER old.
 */
export async function findSession(token: string): Promise<StoredSession | null> {
  const id = hashOf(token);
  const now = Date.now();
  const row = await db('sessions')
    .join('users', 'users.id', 'sessions.user_id')
    .where('sessions.id', id)
    .andWhere('sessions.expires_ms', '>', now)
    .select(
      'users.id',
      'users.email',
      'users.name',
      'users.role',
      'users.disabled',
      'sessions.renewed_ms',
      'sessions.expires_ms',
    )
    .first();
  if (!row || row.disabled || !isRole(row.role)) return null;
  const user: Actor = { id: Number(row.id), email: row.email, name: row.name, role: row.role };
  if (now - Number(row.renewed_ms) <= RENEW_AFTER * 1000) {
    return { user, expires: new Date(Number(row.expires_ms)), renewed: false };
  }
  const expires = now + SESSION_MAX_AGE * 1000;
  await db('sessions').where({ id }).update({ renewed_ms: now, expires_ms: expires });
  return { user, expires: new Date(expires), renewed: true };
}

/** End one session (signing out). */
export async function endSession(token: string): Promise<void> {
  await db('sessions')
    .where({ id: hashOf(token) })
    .delete();
}

/** End every session of a user, inside the transaction that changes the account. */
export async function endUserSessions(trx: Knex.Transaction, userId: number): Promise<void> {
  await trx('sessions').where({ user_id: userId }).delete();
}
