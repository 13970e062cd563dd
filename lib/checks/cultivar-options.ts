import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { listPublishedCultivars } from '@/lib/data/cultivars';

/** Published cultivars for a check's cultivar select, commodity first. */
export async function cultivarOptions(actor: Actor) {
  const cultivars = await listPublishedCultivars(actor);
  return cultivars.map((c) => ({ slug: c.slug, label: `${c.commodity.name} — ${c.name}` }));
}
