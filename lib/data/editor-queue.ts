import 'server-only';
import type { InferResult } from 'kysely';
import { typed } from '@/lib/db-kysely';
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
  return revisionQuery()
    .innerJoin('cultivars as c', 'c.id', 'r.cultivar_id')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .leftJoin('property_revisions as b', 'b.id', 'r.based_on_id')
    .select([
      'c.slug as cultivar_slug',
      'c.name as cultivar_name',
      'm.name as commodity_name',
      'b.number as base_number',
    ]);
}

function toQueueRow(r: InferResult<ReturnType<typeof queueQuery>>[number]): QueueRow {
  return {
    ...toRevision(r),
    cultivarSlug: r.cultivar_slug,
    cultivarName: r.cultivar_name,
    commodityName: r.commodity_name,
    baseNumber: r.base_number,
  };
}

/** What an editor has to do: their own work, the review queue and the latest publications. */
export async function listEditorQueue(actor: Actor, publishedLimit = 10): Promise<EditorQueue> {
  assertCan(actor, 'revisions:edit');
  const [mine, toReview, published] = await Promise.all([
    queueQuery()
      .where('r.author_id', '=', actor.id)
      .where('r.status', 'in', ['draft', 'returned', 'in_review'])
      .orderBy('r.updated_at', 'desc')
      .orderBy('r.id', 'desc')
      .execute(),
    queueQuery()
      .where('r.status', '=', 'in_review')
      .where('r.author_id', '!=', actor.id)
      .orderBy('r.submitted_at')
      .orderBy('r.id')
      .execute(),
    queueQuery()
      .where('r.status', 'in', ['published', 'superseded'])
      .orderBy('r.published_at', 'desc')
      .orderBy('r.id', 'desc')
      .limit(publishedLimit)
      .execute(),
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
  const rows = await typed()
    .selectFrom('cultivars as c')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .orderBy('m.name')
    .orderBy('c.name')
    .select(['c.slug', 'c.name', 'm.name as commodity_name'])
    .execute();
  return rows.map((r) => ({ slug: r.slug, name: r.name, commodityName: r.commodity_name }));
}

/** Every source a value may cite, by key. */
export async function listSources(actor: Actor): Promise<SourceRef[]> {
  assertCan(actor, 'revisions:edit');
  const rows = await typed()
    .selectFrom('sources')
    .selectAll()
    .orderBy('authors')
    .orderBy('year')
    .orderBy('key')
    .execute();
  return rows.map(toSource);
}
