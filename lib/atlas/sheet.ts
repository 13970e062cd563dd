import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { getCultivar } from '@/lib/data/cultivars';
import type { CommodityRef, SourceRef } from '@/lib/properties/records';
import type { Article } from './articles';
import { getUnitSystem } from '@/lib/data/users';
import { cardRows, type CardRow } from './card-rows';
import { getAtlasArticle } from './entries';
import { getSourcesByKeys } from './sources';

export interface HandlingSheet {
  article: Article;
  commodity: CommodityRef;
  cultivars: { slug: string; name: string; revision: number | null; rows: CardRow[] }[];
  /** The article's sources, then those of the values shown, each once. */
  sources: SourceRef[];
}

/** Everything the printable sheet and its PDF show, read fresh; null when there is no article. */
export async function getHandlingSheet(actor: Actor, slug: string): Promise<HandlingSheet | null> {
  const found = await getAtlasArticle(actor, slug);
  if (!found) return null;
  const records = await Promise.all(
    found.article.frontmatter.keyCultivars.map((c) => getCultivar(actor, c)),
  );
  // Values on the sheet (and its PDF) in the reader's own units.
  const system = await getUnitSystem(actor);
  const cultivars = records.map((r) => ({
    slug: r.slug,
    name: r.name,
    revision: r.published?.number ?? null,
    rows: cardRows(r, system),
  }));
  const valueKeys = cultivars.flatMap((c) =>
    c.rows.flatMap((r) => (r.sourceKey ? [r.sourceKey] : [])),
  );
  const keys = [...new Set([...found.article.sourceKeys, ...valueKeys])];
  return { ...found, cultivars, sources: await getSourcesByKeys(actor, keys) };
}
