import 'server-only';
import { forbidden, redirect } from 'next/navigation';
import { cache } from 'react';
import { UnauthenticatedError } from '@/lib/errors';
import { assertCan, type Actor } from './actor';
import { readSession } from './read-session';
import { can, type Capability } from './roles';

/**
 * The signed-in user, from the one session read (readSession): the session row and the user are
 * read fresh from the database, so a disabled account, a changed role or an ended session takes
 * effect on the next request. Memoised per request (React cache), so the layout and the page
 * share one lookup.
 */
export const getCurrentActor = cache(
  async (): Promise<Actor | null> => (await readSession())?.user ?? null,
);

/** For route handlers and server actions: the actor, or a 401/403 AppError. */
export async function requireActor(capability?: Capability): Promise<Actor> {
  const actor = await getCurrentActor();
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
