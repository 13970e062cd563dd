import { ForbiddenError } from '@/lib/errors';
import { can, type Capability, type Role } from './roles';

/** The signed-in user as the server sees them (read fresh from the database each request). */
export interface Actor {
  id: number;
  email: string;
  name: string;
  role: Role;
}

/** Throw a 403 unless the actor's role has the capability. */
export function assertCan(actor: Actor, capability: Capability): void {
  if (!can(actor.role, capability)) {
    throw new ForbiddenError(`The ${actor.role} role may not do this (${capability}).`);
  }
}
