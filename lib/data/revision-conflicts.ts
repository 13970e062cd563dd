import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { toCount } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit-trail';
import { ConflictError, ForbiddenError, NotFoundError } from '@/lib/errors';
import type { SourceRef } from '@/lib/properties/records';
import { parseInput } from '@/lib/validation/parse';
import { resolveConflictSchema } from '@/lib/validation/revision-conflicts';
import { keyed, mergeRevisionValues, sameValue, type StoredValue } from './revision-merge';
import { toSource } from './property-rows';

type Row = StoredValue & { id: number; position: number };

/** A revision's values as stored, in entry order. */
async function storedValues(trx: Knex.Transaction, revisionId: number | null): Promise<Row[]> {
  if (revisionId === null) return [];
  return trx('revision_values')
    .where({ revision_id: revisionId })
    .orderBy('position')
    .orderBy('id');
}

const bare = (r: Row): StoredValue => {
  const copy: Partial<Row> = { ...r };
  delete copy.id;
  delete copy.position;
  delete (copy as { revision_id?: number }).revision_id;
  return copy as StoredValue;
};
const json = (v: StoredValue | null) => (v === null ? null : JSON.stringify(v));

export interface RebaseOutcome {
  carried: string[];
  conflicts: number;
}

/**
 * Inside the rebase's transaction: merge the draft onto `theirsId` three ways (base = the revision
 * it started from), store the merged values, and record each conflict. Conflicts left from an
 * earlier rebase stay open, now against `theirsId`; one the newer revision settles goes.
 */
export async function mergeOntoPublished(
  trx: Knex.Transaction,
  draft: { id: number; based_on_id: number | null },
  theirsId: number | null,
): Promise<RebaseOutcome> {
  const [base, mine, theirs] = await Promise.all(
    [draft.based_on_id, draft.id, theirsId].map((id) => storedValues(trx, id)),
  );
  const result = mergeRevisionValues(base.map(bare), mine.map(bare), theirs.map(bare));
  await trx('revision_values').where({ revision_id: draft.id }).delete();
  if (result.merged.length) {
    await trx('revision_values').insert(
      result.merged.map((v, position) => ({ ...v, revision_id: draft.id, position })),
    );
  }
  const fresh = new Set(result.conflicts.map((c) => c.key));
  const theirsByKey = keyed(theirs.map(bare));
  const mineByKey = keyed(result.merged);
  const old = await trx('revision_conflicts').where({ revision_id: draft.id });
  for (const c of old) {
    const theirsNow = theirsByKey.get(c.value_key) ?? null;
    const mineNow = mineByKey.get(c.value_key) ?? null;
    const settled = sameValue(mineNow, theirsNow);
    if (fresh.has(c.value_key) || settled) {
      await trx('revision_conflicts').where({ id: c.id }).delete();
    } else {
      await trx('revision_conflicts')
        .where({ id: c.id })
        .update({ theirs_value: json(theirsNow), theirs_revision_id: theirsId });
    }
  }
  if (result.conflicts.length) {
    await trx('revision_conflicts').insert(
      result.conflicts.map((c) => ({
        revision_id: draft.id,
        value_key: c.key,
        label: c.label,
        base_value: json(c.base),
        mine_value: json(c.mine),
        theirs_value: json(c.theirs),
        theirs_revision_id: theirsId,
        created_at: new Date(),
      })),
    );
  }
  return { carried: result.carried.map((c) => c.label), conflicts: result.conflicts.length };
}

/** How many conflicts wait on a revision (submission is refused while any do). */
export async function countConflicts(trx: Knex.Transaction, revisionId: number): Promise<number> {
  const { n } = await typed(trx)
    .selectFrom('revision_conflicts')
    .select((eb) => eb.fn.countAll().as('n'))
    .where('revision_id', '=', revisionId)
    .executeTakeFirstOrThrow();
  return toCount(n);
}

export interface ConflictSide extends StoredValue {
  source: SourceRef | null;
}

export interface ConflictView {
  id: number;
  label: string;
  theirsNumber: number | null;
  base: ConflictSide | null;
  mine: ConflictSide | null;
  theirs: ConflictSide | null;
}

/** The open conflicts of a revision, each side with its source, for the author's page. */
export async function listConflicts(actor: Actor, revisionId: number): Promise<ConflictView[]> {
  assertCan(actor, 'revisions:edit');
  const rows = await typed()
    .selectFrom('revision_conflicts as c')
    .leftJoin('property_revisions as t', 't.id', 'c.theirs_revision_id')
    .selectAll('c')
    .select('t.number as theirs_number')
    .where('c.revision_id', '=', revisionId)
    .orderBy('c.id')
    .execute();
  const parse = (text: string | null) => (text ? (JSON.parse(text) as StoredValue) : null);
  const sides = rows.flatMap((r) => [r.base_value, r.mine_value, r.theirs_value].map(parse));
  const ids = [...new Set(sides.map((s) => s?.source_id).filter((x): x is number => x != null))];
  const sources = ids.length
    ? await typed().selectFrom('sources').selectAll().where('id', 'in', ids).execute()
    : [];
  const byId = new Map(sources.map((s) => [s.id, toSource(s)]));
  const side = (text: string | null): ConflictSide | null => {
    const v = parse(text);
    return v
      ? { ...v, source: v.source_id === null ? null : (byId.get(v.source_id) ?? null) }
      : null;
  };
  return rows.map((r) => ({
    id: r.id,
    label: r.label,
    theirsNumber: r.theirs_number ?? null,
    base: side(r.base_value),
    mine: side(r.mine_value),
    theirs: side(r.theirs_value),
  }));
}

/**
 * The author decides one conflict: `mine` keeps the draft's value as it is, `theirs` puts the
 * published revision's value in its place (or removes it, where the published one has none).
 */
export async function resolveConflict(actor: Actor, revisionId: number, input: unknown) {
  assertCan(actor, 'revisions:edit');
  const { conflictId, choice } = parseInput(resolveConflictSchema, input);
  return db.transaction(async (trx) => {
    const revision = await trx('property_revisions').where({ id: revisionId }).first();
    if (!revision) throw new NotFoundError('No such revision.');
    if (revision.author_id !== actor.id) {
      throw new ForbiddenError('Only the author of a draft may resolve its conflicts.');
    }
    if (!['draft', 'returned'].includes(revision.status)) {
      throw new ConflictError('Only a draft or a returned revision can be changed.');
    }
    const conflict = await trx('revision_conflicts')
      .where({ id: conflictId, revision_id: revisionId })
      .first();
    if (!conflict) throw new NotFoundError('No such conflict on this revision (decided already?).');
    if (choice === 'theirs') {
      const values = await storedValues(trx, revisionId);
      const current = [...keyed(values)].find(([key]) => key === conflict.value_key)?.[1];
      const theirs = conflict.theirs_value
        ? (JSON.parse(conflict.theirs_value) as StoredValue)
        : null;
      if (current) await trx('revision_values').where({ id: current.id }).delete();
      if (theirs) {
        const position = current?.position ?? values.length;
        await trx('revision_values').insert({ ...theirs, revision_id: revisionId, position });
      }
    }
    await trx('revision_conflicts').where({ id: conflict.id }).delete();
    await trx('property_revisions').where({ id: revisionId }).update({ updated_at: new Date() });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.resolve',
      entity: 'revision',
      entityId: revisionId,
      detail: { value: conflict.label, choice },
    });
    return { id: revisionId, left: await countConflicts(trx, revisionId) };
  });
}
