import 'server-only';
import { db } from '@/lib/db';
import type { Actor } from './actor';
import { spendVerifyTime, verifyPassword } from './password';
import { isRole } from './roles';

// The account reads that signing in and the session need. They live in lib/auth, not lib/data,
// because lib/data builds on lib/auth (actors, roles, passwords) and must not be imported back.

function toActor(r: Record<string, unknown>): Actor | null {
  if (!r || r.disabled || !isRole(r.role)) return null;
  return { id: Number(r.id), email: String(r.email), name: String(r.name), role: r.role };
}

/**
 * An enabled user by id as an actor, or null (unknown or disabled): for server-side jobs and
 * tests acting as a user. Requests get theirs from the session (lib/auth/read-session.ts).
 */
export async function getActiveActor(id: number): Promise<Actor | null> {
  return toActor(await db('users').where({ id }).first());
}

export type CredentialsResult =
  | { user: Actor; knownId: number; reason?: undefined }
  | {
      user: null;
      knownId: number | null;
      reason: 'unknown-account' | 'wrong-password' | 'disabled';
    };

/** Check an e-mail and password; says why not (for the audit log only, never to the visitor). */
export async function findCredentials(email: string, password: string): Promise<CredentialsResult> {
  const r = (await db('users').where({ email: email.toLowerCase() }).first()) as
    { id: number; password_hash: string } | undefined;
  if (!r) {
    await spendVerifyTime(password);
    return { user: null, knownId: null, reason: 'unknown-account' };
  }
  if (!(await verifyPassword(password, r.password_hash))) {
    return { user: null, knownId: r.id, reason: 'wrong-password' };
  }
  const user = toActor(r as unknown as Record<string, unknown>);
  if (!user) return { user: null, knownId: r.id, reason: 'disabled' };
  return { user, knownId: r.id };
}

/** The enabled user with this e-mail and password, else null. */
export async function verifyCredentials(email: string, password: string): Promise<Actor | null> {
  return (await findCredentials(email, password)).user;
}
