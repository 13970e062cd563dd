import 'server-only';
import { sql, type InferResult } from 'kysely';
import { typed } from '@/lib/db-kysely';
import { toBool } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/roles';
import { NotFoundError } from '@/lib/errors';
import type {
  CommodityRef,
  CultivarRecord,
  RevisionSummary,
  RevisionValue,
} from '@/lib/properties/records';
import { revisionQuery, toRevision, valuesOf } from './property-rows';

export async function listCommodities(actor: Actor): Promise<CommodityRef[]> {
  assertCan(actor, 'properties:read-published');
  const rows = await typed()
    .selectFrom('commodities')
    .select(['id', 'slug', 'name', 'family'])
    .orderBy('family')
    .orderBy('name')
    .execute();
  return rows.map((r) => ({ id: r.id, slug: r.slug, name: r.name, family: r.family }));
}

function cultivarQuery() {
  return typed()
    .selectFrom('cultivars as c')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .selectAll('c')
    .select(['m.slug as m_slug', 'm.name as m_name', 'm.family as m_family']);
}

type CultivarRow = InferResult<ReturnType<typeof cultivarQuery>>[number];

async function toRecords(rows: CultivarRow[]): Promise<CultivarRecord[]> {
  const revisionIds = rows
    .map((r) => r.published_revision_id)
    .filter((id): id is number => id !== null && id > 0);
  const revisions = revisionIds.length
    ? (await revisionQuery().where('r.id', 'in', revisionIds).execute()).map(toRevision)
    : [];
  const values = await valuesOf(revisionIds);
  return rows.map((r) => {
    const published = revisions.find((v) => v.id === r.published_revision_id) ?? null;
    return {
      id: r.id,
      slug: r.slug,
      name: r.name,
      isType: toBool(r.is_type),
      commodity: { id: r.commodity_id, slug: r.m_slug, name: r.m_name, family: r.m_family },
      published,
      values: published ? (values.get(published.id) ?? []) : [],
    };
  });
}

/** Cultivars with a published revision, optionally of one commodity and matching a text. */
export async function listPublishedCultivars(
  actor: Actor,
  filter: { commodity?: string; q?: string } = {},
): Promise<CultivarRecord[]> {
  assertCan(actor, 'properties:read-published');
  let query = cultivarQuery().where('c.published_revision_id', 'is not', null);
  if (filter.commodity) query = query.where('m.slug', '=', filter.commodity);
  if (filter.q) {
    const like = `%${filter.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query = query.where((eb) =>
      eb.or([
        sql<boolean>`lower(c.name) like ${like} escape '\\'`,
        sql<boolean>`lower(m.name) like ${like} escape '\\'`,
      ]),
    );
  }
  const rows = await query.orderBy('m.name').orderBy('c.name').execute();
  return toRecords(rows);
}

/** One cultivar with its published values and sources; 404 when unknown. */
export async function getCultivar(actor: Actor, slug: string): Promise<CultivarRecord> {
  assertCan(actor, 'properties:read-published');
  const row = await cultivarQuery().where('c.slug', '=', slug).executeTakeFirst();
  if (!row) throw new NotFoundError(`No cultivar "${slug.slice(0, 80)}".`);
  const [record] = await toRecords([row]);
  return record;
}

/** Which revisions an actor may see: editors every state, others the published record only. */
function visibleStatuses(actor: Actor): string[] {
  return can(actor.role, 'revisions:edit')
    ? ['draft', 'in_review', 'returned', 'published', 'superseded']
    : ['published', 'superseded'];
}

/**
 * A cultivar's id (and slug) by its slug, or a 404: the lookup every write and listing keyed by
 * a cultivar starts from. Callers check the actor's capability first.
 */
export async function cultivarIdBySlug(slug: string): Promise<{ id: number; slug: string }> {
  const cultivar = await typed()
    .selectFrom('cultivars')
    .select(['id', 'slug'])
    .where('slug', '=', slug)
    .executeTakeFirst();
  if (!cultivar) throw new NotFoundError(`No cultivar "${slug.slice(0, 80)}".`);
  return cultivar;
}

/** A cultivar's revisions, newest first. */
export async function listRevisions(actor: Actor, slug: string): Promise<RevisionSummary[]> {
  assertCan(actor, 'properties:read-history');
  const cultivar = await cultivarIdBySlug(slug);
  const rows = await revisionQuery()
    .where('r.cultivar_id', '=', cultivar.id)
    .where('r.status', 'in', visibleStatuses(actor))
    .orderBy('r.number', 'desc')
    .execute();
  return rows.map(toRevision);
}

/** One revision with its values, if the actor may see it. */
export async function getRevision(
  actor: Actor,
  id: number,
): Promise<RevisionSummary & { values: RevisionValue[]; cultivarSlug: string }> {
  assertCan(actor, 'properties:read-history');
  const row = await revisionQuery()
    .innerJoin('cultivars as c', 'c.id', 'r.cultivar_id')
    .select('c.slug as cultivar_slug')
    .where('r.id', '=', id)
    .where('r.status', 'in', visibleStatuses(actor))
    .executeTakeFirst();
  if (!row) throw new NotFoundError('No such revision.');
  const values = (await valuesOf([id])).get(id) ?? [];
  return { ...toRevision(row), values, cultivarSlug: row.cultivar_slug };
}
