import type { Knex } from 'knex';
import type { Article } from '@/lib/atlas/articles';
import { shortCitation } from '@/lib/atlas/citations';
import { splitSections } from '@/lib/atlas/sections';
import { QUANTITIES, isQuantity } from '@/lib/properties/quantities';
import type { SearchRecord } from './types';

/**
 * Which records a role class may find. `published`: what every reader may see (published
 * cultivars and articles, commodities, the sources they cite). `editorial`: also cultivars with
 * nothing published, open revisions and draft articles.
 */
export type IndexClass = 'published' | 'editorial';

const quantityNames = (rows: { quantity: string; variant: string | null }[]) =>
  rows
    .filter((v) => isQuantity(v.quantity))
    .map(
      (v) =>
        QUANTITIES[v.quantity as keyof typeof QUANTITIES].label +
        (v.variant ? ` ${v.variant}` : ''),
    )
    .join(', ');

async function commodityRecords(knex: Knex, articles: Article[]): Promise<SearchRecord[]> {
  const rows = await knex('commodities').orderBy('name');
  const withArticle = new Set(articles.map((a) => a.slug));
  return rows.map((c) => ({
    id: `commodity:${c.slug}`,
    kind: 'commodity',
    title: String(c.name),
    subtitle: `${c.family} · ${withArticle.has(c.slug) ? 'Atlas article' : 'article in preparation'}`,
    href: withArticle.has(c.slug) ? `/atlas/${c.slug}` : '/atlas',
    keywords: [c.slug, c.botanical_name].filter(Boolean).join(' '),
    text: '',
  }));
}

async function cultivarRecords(knex: Knex, cls: IndexClass): Promise<SearchRecord[]> {
  const query = knex('cultivars as c')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .select('c.id', 'c.slug', 'c.name', 'c.published_revision_id', 'm.name as commodity')
    .orderBy('c.name');
  if (cls === 'published') query.whereNotNull('c.published_revision_id');
  const rows = await query;
  const revisionIds = rows.map((r) => r.published_revision_id).filter((id) => id != null);
  const values = revisionIds.length
    ? await knex('revision_values')
        .whereIn('revision_id', revisionIds)
        .select('revision_id', 'quantity', 'variant')
    : [];
  return rows.map((r) => ({
    id: `cultivar:${r.slug}`,
    kind: 'cultivar',
    title: String(r.name),
    subtitle:
      r.published_revision_id == null
        ? `${r.commodity} · nothing published yet`
        : String(r.commodity),
    href: `/properties/${r.slug}`,
    keywords: r.slug,
    text: quantityNames(values.filter((v) => v.revision_id === r.published_revision_id)),
  }));
}

/** Drafts, revisions in review and returned ones: found by editors only. */
async function openRevisionRecords(knex: Knex): Promise<SearchRecord[]> {
  const rows = await knex('property_revisions as r')
    .join('cultivars as c', 'c.id', 'r.cultivar_id')
    .whereIn('r.status', ['draft', 'in_review', 'returned'])
    .select('r.id', 'r.number', 'r.status', 'r.summary', 'c.name', 'c.slug');
  return rows.map((r) => ({
    id: `revision:${r.id}`,
    kind: 'cultivar',
    title: `${r.name} — revision ${r.number}`,
    subtitle: `${String(r.status).replace('_', ' ')} · editors only`,
    href: `/editor/revisions/${r.id}`,
    keywords: `${r.slug} ${r.status}`,
    text: String(r.summary ?? ''),
  }));
}

async function sourceRecords(
  knex: Knex,
  cls: IndexClass,
  articles: Article[],
): Promise<SearchRecord[]> {
  const rows = await knex('sources').orderBy('key');
  const citing = new Map<string, string>();
  for (const a of articles) for (const k of a.sourceKeys) if (!citing.has(k)) citing.set(k, a.slug);
  const inUse = new Set(
    (
      await knex('revision_values as x')
        .join('cultivars as c', 'c.published_revision_id', 'x.revision_id')
        .join('sources as s', 's.id', 'x.source_id')
        .distinct('s.key')
    ).map((r) => String(r.key)),
  );
  return rows
    .filter((s) => cls === 'editorial' || inUse.has(s.key) || citing.has(s.key))
    .map((s) => ({
      id: `source:${s.key}`,
      kind: 'source',
      title: shortCitation({ authors: s.authors, year: s.year, title: s.title, venue: s.venue }),
      subtitle: String(s.title),
      href: citing.has(s.key) ? `/atlas/${citing.get(s.key)}#source-${s.key}` : null,
      keywords: [s.authors, s.venue, s.key].filter(Boolean).join(' '),
      text: '',
    }));
}

function sectionRecords(articles: Article[]): SearchRecord[] {
  return articles.flatMap((a) =>
    splitSections(a.body).map((sec) => ({
      id: `section:${a.slug}#${sec.id}`,
      kind: 'section' as const,
      title: sec.heading || a.frontmatter.title,
      subtitle:
        [a.frontmatter.title, sec.parent].filter(Boolean).join(' › ') +
        (a.frontmatter.status === 'draft' ? ' · draft' : ''),
      href: `/atlas/${a.slug}${sec.id ? `#${sec.id}` : ''}`,
      keywords: '',
      text: sec.text,
    })),
  );
}

/** Every record one role class may find; `articles` are already filtered for that class. */
export async function loadSearchRecords(
  knex: Knex,
  cls: IndexClass,
  articles: Article[],
): Promise<SearchRecord[]> {
  const [commodities, cultivars, revisions, sources] = await Promise.all([
    commodityRecords(knex, articles),
    cultivarRecords(knex, cls),
    cls === 'editorial' ? openRevisionRecords(knex) : Promise.resolve([]),
    sourceRecords(knex, cls, articles),
  ]);
  return [...commodities, ...cultivars, ...revisions, ...sources, ...sectionRecords(articles)];
}
