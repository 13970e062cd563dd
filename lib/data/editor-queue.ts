import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import type { RevisionSummary, SourceRef } from '@/lib/properties/records';
import { revisionQuery, toRevision, toSource } from './property-rows';

/** A revision as the editor's lists show it: with its cultivar and the number of its base. */
export interface QueueRow extends RevisionSummary {
  cultivarSlug: string;
  cultivarName: string;
  commodityName: string;
  baseNumber: number | null;
}

export interface EditorQueue {
  /** The actor's own drafts, returned revisions and revisions waiting for another editor. */
  mine: QueueRow[];
  /** Other editors' revisions in review: the actor may publish or return these. */
  toReview: QueueRow[];
  /** The latest publications, newest first (some may since be superseded). */
  published: QueueRow[];
}

export interface CultivarChoice {
  slug: string;
  name: string;
  commodityName: string;
}

function queueQuery() {
  return revisionQuery(db)
    .join('cultivars as c', 'c.id', 'r.cultivar_id')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .leftJoin('property_revisions as b', 'b.id', 'r.based_on_id')
    .select(
      'c.slug as cultivar_slug',
      'c.name as cultivar_name',
      'm.name as commodity_name',
      'b.number as base_number',
    );
}

function toQueueRow(r: Record<string, unknown>): QueueRow {
  return {
    ...toRevision(r),
    cultivarSlug: String(r.cultivar_slug),
    cultivarName: String(r.cultivar_name),
    commodityName: String(r.commodity_name),
    baseNumber: r.base_number == null ? null : Number(r.base_number),
  };
}

/** What an editor has to do: their own work, the review queue and the latest publications. */
export async function listEditorQueue(actor: Actor, publishedLimit = 10): Promise<EditorQueue> {
  assertCan(actor, 'revisions:edit');
  const [mine, toReview, published] = await Promise.all([
    queueQuery()
      .where('r.author_id', actor.id)
      .whereIn('r.status', ['draft', 'returned', 'in_review'])
      .orderBy([
        { column: 'r.updated_at', order: 'desc' },
        { column: 'r.id', order: 'desc' },
      ]),
    queueQuery()
      .where('r.status', 'in_review')
      .whereNot('r.author_id', actor.id)
      .orderBy([{ column: 'r.submitted_at' }, { column: 'r.id' }]),
    queueQuery()
      .whereIn('r.status', ['published', 'superseded'])
      .orderBy([
        { column: 'r.published_at', order: 'desc' },
        { column: 'r.id', order: 'desc' },
      ])
      .limit(publishedLimit),
  ]);
  return {
    mine: mine.map(toQueueRow),
    toReview: toReview.map(toQueueRow),
    published: published.map(toQueueRow),
  };
}

/** Every cultivar, published or not, for the "start a draft" choice. */
export async function listCultivarChoices(actor: Actor): Promise<CultivarChoice[]> {
  assertCan(actor, 'revisions:edit');
  const rows = await db('cultivars as c')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .orderBy([{ column: 'm.name' }, { column: 'c.name' }])
    .select('c.slug', 'c.name', 'm.name as commodity_name');
  return rows.map((r) => ({
    slug: String(r.slug),
    name: String(r.name),
    commodityName: String(r.commodity_name),
  }));
}

/** Every source a value may cite, by key. */
export async function listSources(actor: Actor): Promise<SourceRef[]> {
  assertCan(actor, 'revisions:edit');
  const rows = await db('sources').orderBy([
    { column: 'authors' },
    { column: 'year' },
    { column: 'key' },
  ]);
  return rows.map(toSource);
}
