import 'server-only';
import { cookies } from 'next/headers';
import { db } from '@/lib/db';
import { recordAudit } from '@/lib/audit-trail';
import {
  endSession,
  SESSION_MAX_AGE,
  sessionCookieName,
  sessionCookieOptions,
  startSession,
} from './session-store';

/**
 * Sign the browser of this request in as a user who has just proved who they are another way
 * (by spending an invitation link and choosing a password): the same database session and the
 * same cookie as a credentials sign-in (session-store.ts), audited as a sign-in. A session the
 * browser's cookie already held (someone else's, on a shared machine) is ended first, so it is
 * not left live behind the new cookie.
 */
export async function signInThisBrowser(user: { id: number; email: string }, via: string) {
  const jar = await cookies();
  const name = sessionCookieName();
  const previous = jar.get(name)?.value;
  if (previous) await endSession(previous);
  const token = await startSession(user.id);
  jar.set(name, token, {
    ...sessionCookieOptions(),
    expires: new Date(Date.now() + SESSION_MAX_AGE * 1000),
  });
  await db.transaction((trx) =>
    recordAudit(trx, {
      actorId: user.id,
      action: 'sign-in.success',
      entity: 'sign-in',
      entityId: user.id,
      detail: { email: user.email, via },
    }),
  );
}
