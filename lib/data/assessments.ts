import 'server-only';
import type { Knex } from 'knex';
import type { InferResult } from 'kysely';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { assessmentInputs, assessmentResults } from '@/lib/db-json';
import { insertedId, isUniqueViolation, toCount, toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/roles';
import { NotFoundError } from '@/lib/errors';
import type { CheckNameValue } from '@/lib/validation/check-names';
import { parseInput } from '@/lib/validation/parse';
import { assessmentListSchema } from '@/lib/validation/assessments';
import { recordAudit } from '@/lib/audit-trail';

interface Pinned {
  cultivar: string;
  revision_id: number;
  commodity_record?: { cultivar: string; revision_id: number } | null;
}

export interface Assessment {
  id: number;
  ownerId: number;
  ownerName: string;
  check: CheckNameValue;
  title: string;
  notes: string | null;
  inputs: Record<string, unknown>;
  results: Record<string, unknown> & { pinned: Pinned | null };
  cultivarSlug: string | null;
  cultivarName: string | null;
  revisionId: number | null;
  revisionNumber: number | null;
  /** The cultivar's published revision now, when it is newer than the pinned one. */
  newerRevision: { id: number; number: number } | null;
  /** The commodity record's pinned revision, where the result inherited from it. */
  commodityRevisionId: number | null;
  /** The commodity record's published revision now, when it is newer than the pinned one. */
  newerCommodityRevision: { id: number; number: number } | null;
  version: number;
  parentId: number | null;
  /** The first assessment of this one's chain of re-runs (itself for a first version). */
  rootId: number;
  modelVersion: string;
  resultSchema: string;
  createdAt: string;
}

function query() {
  return typed()
    .selectFrom('assessments as a')
    .innerJoin('users as u', 'u.id', 'a.owner_id')
    .leftJoin('cultivars as c', 'c.id', 'a.cultivar_id')
    .leftJoin('property_revisions as r', 'r.id', 'a.revision_id')
    .leftJoin('property_revisions as now', 'now.id', 'c.published_revision_id')
    .leftJoin('property_revisions as cr', 'cr.id', 'a.commodity_revision_id')
    .leftJoin('cultivars as t', 't.id', 'cr.cultivar_id')
    .leftJoin('property_revisions as tnow', 'tnow.id', 't.published_revision_id')
    .selectAll('a')
    .select([
      'u.name as owner_name',
      'c.slug as cultivar_slug',
      'c.name as cultivar_name',
      'r.number as revision_number',
      'now.id as now_id',
      'now.number as now_number',
      'tnow.id as tnow_id',
      'tnow.number as tnow_number',
    ]);
}

function toAssessment(r: InferResult<ReturnType<typeof query>>[number]): Assessment {
  const newer =
    r.now_id !== null &&
    r.now_number !== null &&
    r.revision_id !== null &&
    r.now_id !== r.revision_id
      ? { id: r.now_id, number: r.now_number }
      : null;
  const newerCommodity =
    r.tnow_id !== null &&
    r.tnow_number !== null &&
    r.commodity_revision_id !== null &&
    r.tnow_id !== r.commodity_revision_id
      ? { id: r.tnow_id, number: r.tnow_number }
      : null;
  return {
    id: r.id,
    ownerId: r.owner_id,
    ownerName: r.owner_name,
    check: r.check as CheckNameValue,
    title: r.title,
    notes: r.notes,
    inputs: assessmentInputs.parse(r.inputs),
    // The inside of a result is read by its check's result schema, not here.
    results: assessmentResults.parse(r.results) as Assessment['results'],
    cultivarSlug: r.cultivar_slug,
    cultivarName: r.cultivar_name,
    revisionId: r.revision_id,
    revisionNumber: r.revision_number,
    newerRevision: newer,
    commodityRevisionId: r.commodity_revision_id,
    newerCommodityRevision: newerCommodity,
    version: r.version,
    parentId: r.parent_id,
    rootId: r.root_id ?? r.id,
    modelVersion: r.model_version,
    resultSchema: r.result_schema,
    createdAt: toIso(r.created_at),
  };
}

/** What a check run gives an assessment to keep: its result and how it was made. */
export interface AssessmentRun {
  check: CheckNameValue;
  inputs: Record<string, unknown>;
  results: { pinned: Pinned | null };
  modelVersion: string;
  resultSchema: string;
}

export interface AssessmentMeta {
  title: string;
  notes: string | null;
  /** The assessment this run re-runs: the new row becomes the next version of its chain. */
  rerunOf?: Assessment;
}

/**
 * Keep a check run as an assessment, or as the next version of `rerunOf`'s chain. The version
 * is read and written in one transaction, and the unique (root_id, version) constraint refuses
 * a second writer that read the same number: that writer tries again with the next one.
 */
export async function insertAssessment(
  actor: Actor,
  run: AssessmentRun,
  meta: AssessmentMeta,
): Promise<number> {
  assertCan(actor, 'assessments:manage-own');
  for (let attempt = 1; ; attempt++) {
    try {
      return await db.transaction((trx) => insertRow(trx, actor, run, meta));
    } catch (error) {
      if (!isUniqueViolation(error) || attempt >= 5) throw error;
    }
  }
}

async function insertRow(
  trx: Knex.Transaction,
  actor: Actor,
  run: AssessmentRun,
  meta: AssessmentMeta,
): Promise<number> {
  const pinned = run.results.pinned;
  const cultivar = pinned
    ? await typed(trx)
        .selectFrom('cultivars')
        .select('id')
        .where('slug', '=', pinned.cultivar)
        .executeTakeFirst()
    : undefined;
  const root = meta.rerunOf ? meta.rerunOf.rootId : null;
  let version = 1;
  if (root !== null) {
    const { max } = await typed(trx)
      .selectFrom('assessments')
      .select((eb) => eb.fn.max('version').as('max'))
      .where('root_id', '=', root)
      .executeTakeFirstOrThrow();
    version = toCount(max) + 1;
  }
  const [row] = await trx('assessments')
    .insert({
      owner_id: actor.id,
      check: run.check,
      title: meta.title,
      notes: meta.notes,
      inputs: JSON.stringify(run.inputs),
      results: JSON.stringify(run.results),
      model_version: run.modelVersion,
      result_schema: run.resultSchema,
      cultivar_id: cultivar?.id ?? null,
      revision_id: pinned?.revision_id ?? null,
      commodity_revision_id: pinned?.commodity_record?.revision_id ?? null,
      version,
      parent_id: meta.rerunOf?.id ?? null,
      root_id: root,
      created_at: new Date(),
    })
    .returning('id');
  const id = insertedId(row);
  // A first version is the root of its own chain.
  if (root === null) await trx('assessments').where({ id }).update({ root_id: id });
  await recordAudit(trx, {
    actorId: actor.id,
    action: meta.rerunOf ? 'assessment.rerun' : 'assessment.create',
    entity: 'assessment',
    entityId: id,
    detail: {
      check: run.check,
      revision: pinned?.revision_id ?? null,
      commodityRevision: pinned?.commodity_record?.revision_id ?? null,
      version,
    },
  });
  return id;
}

/** One assessment: its owner's, or anyone's for a role that reads all. */
export async function getAssessment(actor: Actor, id: number): Promise<Assessment> {
  assertCan(actor, 'assessments:manage-own');
  let q = query().where('a.id', '=', id);
  if (!can(actor.role, 'assessments:read-all')) q = q.where('a.owner_id', '=', actor.id);
  const row = await q.executeTakeFirst();
  if (!row) throw new NotFoundError('No such assessment.');
  return toAssessment(row);
}

export async function listAssessments(actor: Actor, filter: unknown = {}): Promise<Assessment[]> {
  assertCan(actor, 'assessments:manage-own');
  const f = parseInput(assessmentListSchema, filter);
  let q = query().orderBy('a.id', 'desc');
  if (!can(actor.role, 'assessments:read-all')) q = q.where('a.owner_id', '=', actor.id);
  if (f.check) q = q.where('a.check', '=', f.check);
  if (f.cultivar) q = q.where('c.slug', '=', f.cultivar);
  return (await q.execute()).map(toAssessment);
}
