import 'server-only';
import { db } from '@/lib/db';
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
  const rows = await db('commodities').orderBy(['family', 'name']);
  return rows.map((r) => ({ id: r.id, slug: r.slug, name: r.name, family: r.family }));
}

function cultivarQuery() {
  return db('cultivars as c')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .select('c.*', 'm.slug as m_slug', 'm.name as m_name', 'm.family as m_family');
}

async function toRecords(rows: Record<string, unknown>[]): Promise<CultivarRecord[]> {
  const revisionIds = rows.map((r) => Number(r.published_revision_id)).filter((id) => id > 0);
  const revisions = revisionIds.length
    ? (await revisionQuery(db).whereIn('r.id', revisionIds)).map(toRevision)
    : [];
  const values = await valuesOf(db, revisionIds);
  return rows.map((r) => {
    const published = revisions.find((v) => v.id === Number(r.published_revision_id)) ?? null;
    return {
      id: Number(r.id),
      slug: String(r.slug),
      name: String(r.name),
      isType: Boolean(r.is_type),
      commodity: {
        id: Number(r.commodity_id),
        slug: String(r.m_slug),
        name: String(r.m_name),
        family: String(r.m_family),
      },
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
  const query = cultivarQuery()
    .whereNotNull('c.published_revision_id')
    .orderBy(['m.name', 'c.name']);
  if (filter.commodity) query.where('m.slug', filter.commodity);
  if (filter.q) {
    const like = `%${filter.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query.where((w) =>
      w
        .whereRaw("lower(c.name) like ? escape '\\'", [like])
        .orWhereRaw("lower(m.name) like ? escape '\\'", [like]),
    );
  }
  return toRecords(await query);
}

/** One cultivar with its published values and sources; 404 when unknown. */
export async function getCultivar(actor: Actor, slug: string): Promise<CultivarRecord> {
  assertCan(actor, 'properties:read-published');
  const row = await cultivarQuery().where('c.slug', slug).first();
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

/** A cultivar's revisions, newest first. */
export async function listRevisions(actor: Actor, slug: string): Promise<RevisionSummary[]> {
  assertCan(actor, 'properties:read-history');
  const cultivar = await db('cultivars').where({ slug }).first();
  if (!cultivar) throw new NotFoundError(`No cultivar "${slug.slice(0, 80)}".`);
  const rows = await revisionQuery(db)
    .where('r.cultivar_id', cultivar.id)
    .whereIn('r.status', visibleStatuses(actor))
    .orderBy('r.number', 'desc');
  return rows.map(toRevision);
}

/** One revision with its values, if the actor may see it. */
export async function getRevision(
  actor: Actor,
  id: number,
): Promise<RevisionSummary & { values: RevisionValue[]; cultivarSlug: string }> {
  assertCan(actor, 'properties:read-history');
  const row = await revisionQuery(db)
    .join('cultivars as c', 'c.id', 'r.cultivar_id')
    .select('c.slug as cultivar_slug')
    .where('r.id', id)
    .whereIn('r.status', visibleStatuses(actor))
    .first();
  if (!row) throw new NotFoundError('No such revision.');
  const values = (await valuesOf(db, [id])).get(id) ?? [];
  return { ...toRevision(row), values, cultivarSlug: String(row.cultivar_slug) };
}
