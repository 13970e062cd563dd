import type { Knex } from 'knex';
import { isQuantity, type RevisionStatus, type SourceKind } from '@/lib/properties/quantities';
import type { RevisionSummary, RevisionValue, SourceRef } from '@/lib/properties/records';

const iso = (v: unknown) => (v == null ? null : new Date(v as string).toISOString());
const num = (v: unknown) => (v == null ? null : Number(v));

export function toSource(r: Record<string, unknown>): SourceRef {
  return {
    id: Number(r.id),
    key: String(r.key),
    kind: r.kind as SourceKind,
    authors: (r.authors as string) ?? null,
    year: num(r.year),
    title: String(r.title),
    venue: (r.venue as string) ?? null,
    pages: (r.pages as string) ?? null,
    doi: (r.doi as string) ?? null,
    url: (r.url as string) ?? null,
    note: (r.note as string) ?? null,
  };
}

/** Revision rows with author and reviewer names. */
export function revisionQuery(knex: Knex | Knex.Transaction) {
  return knex('property_revisions as r')
    .join('users as a', 'a.id', 'r.author_id')
    .leftJoin('users as v', 'v.id', 'r.reviewer_id')
    .select('r.*', 'a.name as author_name', 'v.name as reviewer_name');
}

export function toRevision(r: Record<string, unknown>): RevisionSummary {
  return {
    id: Number(r.id),
    cultivarId: Number(r.cultivar_id),
    number: Number(r.number),
    status: r.status as RevisionStatus,
    authorId: Number(r.author_id),
    authorName: String(r.author_name),
    reviewerName: (r.reviewer_name as string) ?? null,
    reviewComment: (r.review_comment as string) ?? null,
    basedOnId: num(r.based_on_id),
    summary: (r.summary as string) ?? null,
    isDemo: Boolean(r.is_demo),
    createdAt: iso(r.created_at)!,
    submittedAt: iso(r.submitted_at),
    reviewedAt: iso(r.reviewed_at),
    publishedAt: iso(r.published_at),
    supersededAt: iso(r.superseded_at),
  };
}

/** The values of some revisions, with their sources, keyed by revision id, in entry order. */
export async function valuesOf(
  knex: Knex | Knex.Transaction,
  revisionIds: number[],
): Promise<Map<number, RevisionValue[]>> {
  const out = new Map<number, RevisionValue[]>(revisionIds.map((id) => [id, []]));
  if (!revisionIds.length) return out;
  const rows = await knex('revision_values as x')
    .leftJoin('sources as s', 's.id', 'x.source_id')
    .whereIn('x.revision_id', revisionIds)
    .orderBy([{ column: 'x.revision_id' }, { column: 'x.position' }, { column: 'x.id' }])
    .select(
      'x.*',
      's.key as s_key',
      's.kind as s_kind',
      's.authors as s_authors',
      's.year as s_year',
      's.title as s_title',
      's.venue as s_venue',
      's.pages as s_pages',
      's.doi as s_doi',
      's.url as s_url',
      's.note as s_note',
    );
  for (const r of rows) {
    if (!isQuantity(r.quantity)) continue;
    const source =
      r.source_id == null
        ? null
        : toSource({
            id: r.source_id,
            key: r.s_key,
            kind: r.s_kind,
            authors: r.s_authors,
            year: r.s_year,
            title: r.s_title,
            venue: r.s_venue,
            pages: r.s_pages,
            doi: r.s_doi,
            url: r.s_url,
            note: r.s_note,
          });
    out.get(Number(r.revision_id))!.push({
      id: Number(r.id),
      quantity: r.quantity,
      variant: r.variant ?? '',
      value: Number(r.value),
      unit: r.unit,
      low: num(r.low),
      high: num(r.high),
      sd: num(r.sd),
      samples: num(r.samples),
      method: r.method ?? null,
      ripeness: r.ripeness ?? null,
      temperature: r.temperature ?? null,
      storage: r.storage ?? null,
      loadingRate: r.loading_rate ?? null,
      probe: r.probe ?? null,
      note: r.note ?? null,
      isTypicalDefault: Boolean(r.is_typical_default),
      source,
    });
  }
  return out;
}
