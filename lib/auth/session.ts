import 'server-only';
import { getServerSession } from 'next-auth';
import { forbidden, redirect } from 'next/navigation';
import { cache } from 'react';
import { authOptions } from '@/auth';
import { UnauthenticatedError } from '@/lib/errors';
import { getActiveActor } from './accounts';
import { assertCan, type Actor } from './actor';
import { readSessionClaims } from './session-claims';
import { can, type Capability } from './roles';

/**
 * The signed-in user, read fresh from the database: a disabled account, a changed role or an
 * ended session (older generation) takes effect on the next request, whatever the cookie says.
 * Memoised per request (React cache), so the layout and the page share one lookup.
 */
export const getCurrentActor = cache(async (): Promise<Actor | null> => {
  const session = await getServerSession(authOptions);
  const id = Number(session?.user?.id);
  const generation = Number(session?.user?.generation);
  if (!Number.isInteger(id) || id <= 0 || !Number.isInteger(generation)) return null;
  return getActiveActor(id, generation);
});

/**
 * The signed-in user for route handlers and server actions: the session cookie decrypted once
 * (readSessionClaims), then the account and its session generation read fresh from the database.
 */
const getRequestActor = cache(async (): Promise<Actor | null> => {
  const claims = await readSessionClaims();
  return claims ? getActiveActor(claims.id, claims.generation) : null;
});

/** For route handlers and server actions: the actor, or a 401/403 AppError. */
export async function requireActor(capability?: Capability): Promise<Actor> {
  const actor = await getRequestActor();
  if (!actor) throw new UnauthenticatedError();
  if (capability) assertCan(actor, capability);
  return actor;
}

/** For pages: redirect signed-out visitors to sign-in; show the 403 page for a role without the capability. */
export async function requirePageActor(capability?: Capability): Promise<Actor> {
  const actor = await getCurrentActor();
  if (!actor) redirect('/sign-in');
  if (capability && !can(actor.role, capability)) forbidden();
  return actor;
}
