import 'server-only';
import { notFound } from 'next/navigation';
import type { Actor } from '@/lib/auth/actor';
import { getCurrentActor } from '@/lib/auth/session';
import { getCultivar } from '@/lib/data/cultivars';
import { NotFoundError } from '@/lib/errors';
import { slugSchema } from '@/lib/validation/cultivars';

/** The cultivar of a page address, or the 404 page for a malformed or unknown slug. */
export async function getCultivarOr404(actor: Actor, slug: string) {
  if (!slugSchema.safeParse(slug).success) notFound();
  try {
    return await getCultivar(actor, slug);
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

/** The page title: the cultivar's name where the reader may see it, else the area's. */
export async function cultivarTitle(slug: string, suffix = ''): Promise<string> {
  const actor = await getCurrentActor();
  if (!actor || !slugSchema.safeParse(slug).success) return 'Properties';
  const cultivar = await getCultivar(actor, slug).catch(() => null);
  return cultivar ? `${cultivar.commodity.name}, ${cultivar.name}${suffix}` : 'Properties';
}
