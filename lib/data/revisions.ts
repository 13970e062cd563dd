import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { insertedId, toCount } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '@/lib/errors';
import type { RevisionStatus } from '@/lib/properties/quantities';
import { valueRow } from './value-row';
import { parseInput } from '@/lib/validation/parse';
import { draftUpdateSchema, reviewCommentSchema } from '@/lib/validation/revisions';
import { recordAudit } from '@/lib/audit-trail';
import { notifyFollowers } from './follows';
import { countConflicts, mergeOntoPublished } from './revision-conflicts';
import { mailPublished, mailReturned, mailSubmitted } from './revision-mail';
import { otherOpenRevisions } from './revision-others';

/**
 * The editors' workflow: draft → in review → published (or returned, then draft again). A
 * published revision is superseded by the next one and kept forever; published and superseded
 * rows are never updated or deleted — every write below is guarded by the states it may touch.
 */
const EDITABLE: RevisionStatus[] = ['draft', 'returned'];

/** A row without its primary key, to insert as a new row. */
function withoutId(row: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(row).filter(([key]) => key !== 'id'));
}

async function loadRevision(trx: Knex.Transaction, id: number) {
  const row = await typed(trx)
    .selectFrom('property_revisions')
    .selectAll()
    .where('id', '=', id)
    .executeTakeFirst();
  if (!row) throw new NotFoundError('No such revision.');
  return row;
}

async function cultivarWhere(trx: Knex.Transaction, where: { id: number } | { slug: string }) {
  const query = typed(trx).selectFrom('cultivars').select(['id', 'published_revision_id']);
  return 'id' in where
    ? query.where('id', '=', where.id).executeTakeFirst()
    : query.where('slug', '=', where.slug).executeTakeFirst();
}

/** Move a revision from one of `from` to `to`; a racing change (0 rows) is a 409. */
async function transition(
  trx: Knex.Transaction,
  id: number,
  from: RevisionStatus[],
  patch: Record<string, unknown>,
  refusal: string,
) {
  const n = await trx('property_revisions')
    .where({ id })
    .whereIn('status', from)
    .update({ ...patch, updated_at: new Date() });
  if (n !== 1) throw new ConflictError(refusal);
}

function stateName(status: string): string {
  return status.replace('_', ' ');
}

/** Start a draft from the cultivar's published revision (or an empty one if none yet). */
export async function createDraft(actor: Actor, slug: string, summary?: string | null) {
  assertCan(actor, 'revisions:edit');
  return db.transaction(async (trx) => {
    const cultivar = await cultivarWhere(trx, { slug });
    if (!cultivar) throw new NotFoundError(`No cultivar "${slug.slice(0, 80)}".`);
    const { max } = await typed(trx)
      .selectFrom('property_revisions')
      .select((eb) => eb.fn.max('number').as('max'))
      .where('cultivar_id', '=', cultivar.id)
      .executeTakeFirstOrThrow();
    const base = cultivar.published_revision_id;
    const [row] = await trx('property_revisions')
      .insert({
        cultivar_id: cultivar.id,
        number: toCount(max) + 1,
        status: 'draft',
        author_id: actor.id,
        based_on_id: base,
        summary: summary ?? null,
        created_at: new Date(),
        updated_at: new Date(),
      })
      .returning('id');
    const id = insertedId(row);
    if (base !== null) {
      const copied = await typed(trx)
        .selectFrom('revision_values')
        .selectAll()
        .where('revision_id', '=', base)
        .orderBy('position')
        .execute();
      if (copied.length) {
        await trx('revision_values').insert(
          copied.map((v) => ({ ...withoutId(v), revision_id: id })),
        );
      }
    }
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.draft',
      entity: 'revision',
      entityId: id,
      detail: { cultivar: slug, basedOn: base },
    });
    return { id, cultivarSlug: slug, otherOpen: await otherOpenRevisions(trx, cultivar.id, id) };
  });
}

function assertAuthor(actor: Actor, row: { author_id: number }) {
  if (row.author_id !== actor.id) {
    throw new ForbiddenError('Only the author of a draft may change, submit or rebase it.');
  }
}

/** Replace a draft's summary and values; refused once it is in review or published. */
export async function updateDraft(actor: Actor, id: number, input: unknown) {
  assertCan(actor, 'revisions:edit');
  const change = parseInput(draftUpdateSchema, input);
  return db.transaction(async (trx) => {
    const row = await loadRevision(trx, id);
    assertAuthor(actor, row);
    const keys = [...new Set(change.values.map((v) => v.sourceKey).filter(Boolean))] as string[];
    const sources = keys.length
      ? await typed(trx)
          .selectFrom('sources')
          .select(['id', 'key'])
          .where('key', 'in', keys)
          .execute()
      : [];
    const sourceId = new Map(sources.map((s) => [s.key, s.id]));
    const unknown: Record<string, string[]> = {};
    change.values.forEach((v, i) => {
      if (v.sourceKey && !sourceId.has(v.sourceKey)) {
        unknown[`values.${i}.sourceKey`] = [`No source with the key "${v.sourceKey}".`];
      }
    });
    if (Object.keys(unknown).length)
      throw new ValidationError('Some sources are unknown.', unknown);
    await transition(
      trx,
      id,
      EDITABLE,
      { summary: change.summary },
      `Revision ${row.number} is ${stateName(row.status)}; only a draft or a returned revision can be edited.`,
    );
    await trx('revision_values').where({ revision_id: id }).delete();
    if (change.values.length) {
      await trx('revision_values').insert(
        change.values.map((v, position) =>
          valueRow(v, id, position, v.sourceKey ? sourceId.get(v.sourceKey)! : null),
        ),
      );
    }
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.edit',
      entity: 'revision',
      entityId: id,
      detail: { values: change.values.length },
    });
    return { id };
  });
}

export async function submitDraft(actor: Actor, id: number) {
  assertCan(actor, 'revisions:edit');
  const result = await db.transaction(async (trx) => {
    const row = await loadRevision(trx, id);
    assertAuthor(actor, row);
    const { n } = await typed(trx)
      .selectFrom('revision_values')
      .select((eb) => eb.fn.countAll().as('n'))
      .where('revision_id', '=', id)
      .executeTakeFirstOrThrow();
    if (toCount(n) === 0) throw new ValidationError('Add at least one value before submitting.');
    const open = await countConflicts(trx, id);
    if (open > 0) {
      throw new ValidationError(
        `Decide the ${open === 1 ? 'conflict' : `${open} conflicts`} with the published revision first: keep yours or take the published value for each.`,
      );
    }
    await transition(
      trx,
      id,
      EDITABLE,
      { status: 'in_review', submitted_at: new Date() },
      `Revision ${row.number} is ${stateName(row.status)}; only a draft or a returned revision can be submitted.`,
    );
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.submit',
      entity: 'revision',
      entityId: id,
    });
    return { id, status: 'in_review' as const };
  });
  await mailSubmitted(id);
  return result;
}

function assertNotAuthor(actor: Actor, row: { author_id: number }) {
  if (row.author_id === actor.id) {
    throw new ForbiddenError(
      'Another editor must review this revision: nobody publishes or returns their own.',
    );
  }
}

/** Send a revision in review back to its author with a comment. */
export async function returnRevision(actor: Actor, id: number, input: unknown) {
  assertCan(actor, 'revisions:review');
  const { comment } = parseInput(reviewCommentSchema, input);
  const result = await db.transaction(async (trx) => {
    const row = await loadRevision(trx, id);
    assertNotAuthor(actor, row);
    await transition(
      trx,
      id,
      ['in_review'],
      {
        status: 'returned',
        reviewer_id: actor.id,
        review_comment: comment,
        reviewed_at: new Date(),
      },
      `Revision ${row.number} is ${stateName(row.status)}; only a revision in review can be returned.`,
    );
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.return',
      entity: 'revision',
      entityId: id,
      detail: { comment },
    });
    return { id, status: 'returned' as const };
  });
  await mailReturned(id);
  return result;
}

async function numberOf(trx: Knex.Transaction, id: number | null): Promise<string> {
  if (id === null) return 'nothing';
  const row = await typed(trx)
    .selectFrom('property_revisions')
    .select('number')
    .where('id', '=', id)
    .executeTakeFirst();
  return row ? `revision ${row.number}` : 'another revision';
}

/** The 409 text: which revision was published meanwhile, and what to do. */
async function staleBaseMessage(trx: Knex.Transaction, cultivarId: number, base: number | null) {
  const cultivar = await cultivarWhere(trx, { id: cultivarId });
  const newer = await numberOf(trx, cultivar?.published_revision_id ?? null);
  return `This draft was started from ${await numberOf(trx, base)}, but ${newer} has been published since. Rebase the draft on ${newer}, check its values, and submit it again.`;
}

/**
 * Publish a revision in review. The cultivar's published pointer moves only if it still points
 * at the revision the draft was based on (compare-and-swap), so of two publishers racing, one
 * wins and the other gets a 409 naming the newer revision.
 */
export async function publishRevision(actor: Actor, id: number) {
  assertCan(actor, 'revisions:review');
  const result = await db.transaction(async (trx) => {
    const row = await loadRevision(trx, id);
    assertNotAuthor(actor, row);
    if (row.status !== 'in_review') {
      throw new ConflictError(
        `Revision ${row.number} is ${stateName(row.status)}; only a revision in review can be published.`,
      );
    }
    const base = row.based_on_id;
    const swap = trx('cultivars').where({ id: row.cultivar_id });
    if (base === null) swap.whereNull('published_revision_id');
    else swap.where({ published_revision_id: base });
    if ((await swap.update({ published_revision_id: id })) !== 1) {
      throw new ConflictError(await staleBaseMessage(trx, row.cultivar_id, base));
    }
    const now = new Date();
    if (base !== null) {
      await transition(
        trx,
        base,
        ['published'],
        { status: 'superseded', superseded_at: now },
        'The previous revision is no longer published.',
      );
    }
    await transition(
      trx,
      id,
      ['in_review'],
      { status: 'published', reviewer_id: actor.id, reviewed_at: now, published_at: now },
      `Revision ${row.number} changed while it was being published.`,
    );
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.publish',
      entity: 'revision',
      entityId: id,
      detail: { supersedes: base },
    });
    return { id, cultivarId: row.cultivar_id, number: row.number, base };
  });
  await notifyFollowers(result);
  await mailPublished(id);
  return { id, status: 'published' as const };
}

/**
 * Move a draft onto the cultivar's current published revision by a three-way merge (base = the
 * revision it started from): values only the newer revision changed are carried in, values both
 * changed become conflicts the author decides before the draft can be submitted again.
 */
export async function rebaseDraft(actor: Actor, id: number) {
  assertCan(actor, 'revisions:edit');
  return db.transaction(async (trx) => {
    const row = await loadRevision(trx, id);
    assertAuthor(actor, row);
    const cultivar = await cultivarWhere(trx, { id: row.cultivar_id });
    if (!cultivar) throw new NotFoundError('No such cultivar.');
    const target = cultivar.published_revision_id;
    await transition(
      trx,
      id,
      ['draft', 'returned', 'in_review'],
      { based_on_id: target, status: 'draft', submitted_at: null },
      `Revision ${row.number} is ${stateName(row.status)}; it can no longer be rebased.`,
    );
    const outcome = await mergeOntoPublished(trx, row, target);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.rebase',
      entity: 'revision',
      entityId: id,
      detail: { from: row.based_on_id, to: target, ...outcome },
    });
    return { id, basedOnId: target, onto: await numberOf(trx, target), ...outcome };
  });
}
