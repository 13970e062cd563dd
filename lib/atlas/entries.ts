import 'server-only';
import { typed } from '@/lib/db-kysely';
import { toBool } from '@/lib/db-values';
import type { Actor } from '@/lib/auth/actor';
import { listCommodities } from '@/lib/data/cultivars';
import type { CommodityRef } from '@/lib/properties/records';
import { seesDrafts } from './access';
import { findArticle, listArticles, type Article } from './articles';

export interface AtlasPhoto {
  id: number;
  alt: string;
  isDemo: boolean;
}

export interface AtlasEntry {
  commodity: CommodityRef;
  /** Null: no article yet ("article in preparation"). */
  article: Article | null;
  photo: AtlasPhoto | null;
}

/** The first photo of any cultivar of each commodity (photos are served by /api/photos). */
async function firstPhotos(commodityIds: number[]): Promise<Map<number, AtlasPhoto>> {
  if (!commodityIds.length) return new Map();
  const rows = await typed()
    .selectFrom('images as i')
    .innerJoin('cultivars as c', 'c.id', 'i.cultivar_id')
    .where('c.commodity_id', 'in', commodityIds)
    .orderBy('i.created_at')
    .orderBy('i.id')
    .select(['i.id', 'i.caption', 'i.is_demo', 'c.commodity_id', 'c.name as cultivar'])
    .execute();
  const out = new Map<number, AtlasPhoto>();
  for (const r of rows) {
    if (out.has(r.commodity_id)) continue;
    out.set(r.commodity_id, {
      id: r.id,
      alt: r.caption ?? `Photo of ${r.cultivar}`,
      isDemo: toBool(r.is_demo),
    });
  }
  return out;
}

/** Every commodity of the database, grouped by family, with its article and a photo if any. */
export async function listAtlasFamilies(
  actor: Actor,
): Promise<{ family: string; entries: AtlasEntry[] }[]> {
  const commodities = await listCommodities(actor);
  const articles = listArticles({ includeDrafts: seesDrafts(actor.role) });
  const photos = await firstPhotos(commodities.map((c) => c.id));
  const families = new Map<string, AtlasEntry[]>();
  for (const commodity of commodities) {
    const entry = {
      commodity,
      article: articles.find((a) => a.frontmatter.commodity === commodity.slug) ?? null,
      photo: photos.get(commodity.id) ?? null,
    };
    families.set(commodity.family, [...(families.get(commodity.family) ?? []), entry]);
  }
  return [...families].map(([family, entries]) => ({ family, entries }));
}

/** The article of a commodity the actor may read, with its commodity; null when there is none. */
export async function getAtlasArticle(actor: Actor, slug: string) {
  const article = findArticle(slug, { includeDrafts: seesDrafts(actor.role) });
  if (!article) return null;
  const commodity = (await listCommodities(actor)).find((c) => c.slug === slug);
  return commodity ? { article, commodity } : null;
}
