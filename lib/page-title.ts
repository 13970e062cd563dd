import 'server-only';
import type { Metadata } from 'next';
import { can, type Capability } from '@/lib/auth/roles';
import { getCurrentActor } from '@/lib/auth/session';

/**
 * A gated page's title. For a role that may not open the page the title is the refusal, so the
 * 403 answer does not name the page in its head (metadata is resolved even when the page is
 * refused). Use as `export const generateMetadata = titleFor('users:manage', 'Users')`.
 */
export function titleFor(capability: Capability, title: string) {
  return async function generateMetadata(): Promise<Metadata> {
    const actor = await getCurrentActor();
    if (actor && !can(actor.role, capability))
      return { title: `Not open to the ${actor.role} role` };
    return { title };
  };
}
