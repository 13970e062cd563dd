import type { Kysely, Selectable } from 'kysely';
import { typed } from '@/lib/db-kysely';
import type { Database, PropertyRevisionsTable, SourcesTable } from '@/lib/db-schema';
import { toBool, toIso, toIsoOrNull } from '@/lib/db-values';
import {
  asObservation,
  asStage,
  asTypicalBasis,
  isQuantity,
  type RevisionStatus,
  type SourceKind,
} from '@/lib/properties/quantities';
import type { RevisionSummary, RevisionValue, SourceRef } from '@/lib/properties/records';

export function toSource(r: Selectable<SourcesTable>): SourceRef {
  return {
    id: r.id,
    key: r.key,
    kind: r.kind as SourceKind,
    authors: r.authors,
    year: r.year,
    title: r.title,
    venue: r.venue,
    pages: r.pages,
    doi: r.doi,
    url: r.url,
    note: r.note,
  };
}

/** Revision rows with author and reviewer names. */
export function revisionQuery(kysely: Kysely<Database> = typed()) {
  return kysely
    .selectFrom('property_revisions as r')
    .innerJoin('users as a', 'a.id', 'r.author_id')
    .leftJoin('users as v', 'v.id', 'r.reviewer_id')
    .selectAll('r')
    .select(['a.name as author_name', 'v.name as reviewer_name']);
}

export type RevisionRow = Selectable<PropertyRevisionsTable> & {
  author_name: string;
  reviewer_name: string | null;
};

export function toRevision(r: RevisionRow): RevisionSummary {
  return {
    id: r.id,
    cultivarId: r.cultivar_id,
    number: r.number,
    status: r.status as RevisionStatus,
    authorId: r.author_id,
    authorName: r.author_name,
    reviewerName: r.reviewer_name,
    reviewComment: r.review_comment,
    basedOnId: r.based_on_id,
    summary: r.summary,
    isDemo: toBool(r.is_demo),
    createdAt: toIso(r.created_at),
    submittedAt: toIsoOrNull(r.submitted_at),
    reviewedAt: toIsoOrNull(r.reviewed_at),
    publishedAt: toIsoOrNull(r.published_at),
    supersededAt: toIsoOrNull(r.superseded_at),
  };
}

/** The sources some values cite, by id. */
async function sourcesById(kysely: Kysely<Database>, ids: number[]) {
  const rows = ids.length
    ? await kysely.selectFrom('sources').selectAll().where('id', 'in', ids).execute()
    : [];
  return new Map(rows.map((s) => [s.id, toSource(s)]));
}

/** The values of some revisions, with their sources, keyed by revision id, in entry order. */
export async function valuesOf(
  revisionIds: number[],
  kysely: Kysely<Database> = typed(),
): Promise<Map<number, RevisionValue[]>> {
  const out = new Map<number, RevisionValue[]>(revisionIds.map((id) => [id, []]));
  if (!revisionIds.length) return out;
  const rows = await kysely
    .selectFrom('revision_values')
    .selectAll()
    .where('revision_id', 'in', revisionIds)
    .orderBy('revision_id')
    .orderBy('position')
    .orderBy('id')
    .execute();
  const cited = [...new Set(rows.map((r) => r.source_id).filter((id) => id !== null))];
  const sources = await sourcesById(kysely, cited);
  for (const r of rows) {
    if (!isQuantity(r.quantity)) continue;
    out.get(r.revision_id)!.push({
      id: r.id,
      quantity: r.quantity,
      variant: r.variant,
      value: r.value,
      unit: r.unit,
      low: r.low,
      high: r.high,
      sd: r.sd,
      samples: r.samples,
      method: r.method,
      ripeness: r.ripeness,
      temperature: r.temperature,
      storage: r.storage,
      loadingRate: r.loading_rate,
      probe: r.probe,
      note: r.note,
      isTypicalDefault: toBool(r.is_typical_default),
      stage: asStage(r.stage),
      observation: asObservation(r.observation),
      typicalBasis: asTypicalBasis(r.typical_basis),
      source: r.source_id === null ? null : (sources.get(r.source_id) ?? null),
    });
  }
  return out;
}
