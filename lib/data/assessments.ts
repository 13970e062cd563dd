import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/roles';
import { NotFoundError } from '@/lib/errors';
import { CHECK_RUNNERS, type CheckName } from '@/lib/checks/registry';
import { parseInput } from '@/lib/validation/parse';
import { assessmentListSchema, assessmentSchema } from '@/lib/validation/assessments';
import { recordAudit } from './audit-trail';

interface Pinned {
  cultivar: string;
  revision_id: number;
}

export interface Assessment {
  id: number;
  ownerId: number;
  ownerName: string;
  check: CheckName;
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
  version: number;
  parentId: number | null;
  createdAt: string;
}

function query() {
  return db('assessments as a')
    .join('users as u', 'u.id', 'a.owner_id')
    .leftJoin('cultivars as c', 'c.id', 'a.cultivar_id')
    .leftJoin('property_revisions as r', 'r.id', 'a.revision_id')
    .leftJoin('property_revisions as now', 'now.id', 'c.published_revision_id')
    .select(
      'a.*',
      'u.name as owner_name',
      'c.slug as cultivar_slug',
      'c.name as cultivar_name',
      'r.number as revision_number',
      'now.id as now_id',
      'now.number as now_number',
    );
}

function toAssessment(r: Record<string, unknown>): Assessment {
  const newer =
    r.now_id != null && r.revision_id != null && Number(r.now_id) !== Number(r.revision_id);
  return {
    id: Number(r.id),
    ownerId: Number(r.owner_id),
    ownerName: String(r.owner_name),
    check: r.check as CheckName,
    title: String(r.title),
    notes: (r.notes as string) ?? null,
    inputs: JSON.parse(String(r.inputs)),
    results: JSON.parse(String(r.results)),
    cultivarSlug: (r.cultivar_slug as string) ?? null,
    cultivarName: (r.cultivar_name as string) ?? null,
    revisionId: r.revision_id == null ? null : Number(r.revision_id),
    revisionNumber: r.revision_number == null ? null : Number(r.revision_number),
    newerRevision: newer ? { id: Number(r.now_id), number: Number(r.now_number) } : null,
    version: Number(r.version),
    parentId: r.parent_id == null ? null : Number(r.parent_id),
    createdAt: new Date(r.created_at as string).toISOString(),
  };
}

/** Run the check on the server (never trusting a client's numbers) and keep it with its data. */
async function saveRun(
  actor: Actor,
  fields: {
    check: CheckName;
    title: string;
    notes: string | null;
    inputs: Record<string, unknown>;
    version: number;
    parentId: number | null;
  },
) {
  const results = (await CHECK_RUNNERS[fields.check](actor, fields.inputs)) as {
    pinned: Pinned | null;
  };
  return db.transaction(async (trx) => {
    const cultivar = results.pinned
      ? await trx('cultivars').where({ slug: results.pinned.cultivar }).first()
      : null;
    const [row] = await trx('assessments')
      .insert({
        owner_id: actor.id,
        check: fields.check,
        title: fields.title,
        notes: fields.notes,
        inputs: JSON.stringify(fields.inputs),
        results: JSON.stringify(results),
        cultivar_id: cultivar?.id ?? null,
        revision_id: results.pinned?.revision_id ?? null,
        version: fields.version,
        parent_id: fields.parentId,
        created_at: new Date(),
      })
      .returning('id');
    const id = typeof row === 'object' ? Number(row.id) : Number(row);
    await recordAudit(trx, {
      actorId: actor.id,
      action: fields.parentId ? 'assessment.rerun' : 'assessment.create',
      entity: 'assessment',
      entityId: id,
      detail: { check: fields.check, revision: results.pinned?.revision_id ?? null },
    });
    return id;
  });
}

export async function createAssessment(actor: Actor, input: unknown): Promise<number> {
  assertCan(actor, 'assessments:manage-own');
  const v = parseInput(assessmentSchema, input);
  return saveRun(actor, {
    check: v.check,
    title: v.title,
    notes: v.notes ?? null,
    inputs: v.inputs,
    version: 1,
    parentId: null,
  });
}

/** One assessment: its owner's, or anyone's for a role that reads all. */
export async function getAssessment(actor: Actor, id: number): Promise<Assessment> {
  assertCan(actor, 'assessments:manage-own');
  const q = query().where('a.id', id);
  if (!can(actor.role, 'assessments:read-all')) q.where('a.owner_id', actor.id);
  const row = await q.first();
  if (!row) throw new NotFoundError('No such assessment.');
  return toAssessment(row);
}

export async function listAssessments(actor: Actor, filter: unknown = {}): Promise<Assessment[]> {
  assertCan(actor, 'assessments:manage-own');
  const f = parseInput(assessmentListSchema, filter);
  const q = query().orderBy('a.id', 'desc');
  if (!can(actor.role, 'assessments:read-all')) q.where('a.owner_id', actor.id);
  if (f.check) q.where('a.check', f.check);
  if (f.cultivar) q.where('c.slug', f.cultivar);
  return (await q).map(toAssessment);
}

/** Re-run with the same inputs on today's published data: a new version beside the old. */
export async function rerunAssessment(actor: Actor, id: number): Promise<number> {
  const old = await getAssessment(actor, id);
  const [{ max }] = await db('assessments')
    .where('id', id)
    .orWhere('parent_id', id)
    .max({ max: 'version' });
  return saveRun(actor, {
    check: old.check,
    title: old.title,
    notes: old.notes,
    inputs: old.inputs,
    version: Number(max ?? old.version) + 1,
    parentId: old.id,
  });
}
