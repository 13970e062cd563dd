import 'server-only';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { assertCan, type Actor } from '@/lib/auth/actor';
import type { TestSource, UploadedTestFacts } from '@/lib/lab-tests/test-source';
import type { RevisionValue } from '@/lib/properties/records';
import type { RevisionValueInput } from '@/lib/validation/revisions';
import { recordAudit } from '@/lib/audit-trail';
import { getRevision } from './cultivars';
import { createDraft, updateDraft } from './revisions';
import type { TestKind, UploadedTestRecord } from './uploaded-tests';

/** The facts every test's source is written from. */
export function uploadedFacts(test: UploadedTestRecord): UploadedTestFacts {
  return {
    id: test.id,
    createdAt: test.createdAt,
    uploaderName: test.uploadedBy.name,
    isDemo: test.isDemo,
  };
}

/** The test's source, created once (with its audit row) and reused by later drafts. */
async function ensureTestSource(
  actor: Actor,
  source: TestSource,
  detail: Record<string, unknown>,
): Promise<void> {
  await db.transaction(async (trx) => {
    if (await trx('sources').where({ key: source.key }).first()) return;
    await trx('sources').insert({ ...source, created_at: new Date() });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'source.create',
      entity: 'source',
      entityId: source.key,
      detail: { kind: source.kind, ...detail },
    });
  });
}

/** The draft recorded on a test, if it is still this actor's and still editable. */
async function openDraftOf(actor: Actor, draftRevisionId: number | null) {
  if (draftRevisionId === null) return null;
  const row = await typed()
    .selectFrom('property_revisions')
    .select('id')
    .where('id', '=', draftRevisionId)
    .where('author_id', '=', actor.id)
    .where('status', 'in', ['draft', 'returned'])
    .executeTakeFirst();
  return row ? row.id : null;
}

/**
 * Remove a draft this actor just made. createDraft and updateDraft each commit on their own; if a
 * later step fails, the new draft goes again so no half-made draft is left behind.
 */
async function discardDraft(actor: Actor, id: number, reason: string): Promise<void> {
  await db.transaction(async (trx) => {
    const mine = trx('property_revisions').where({ id, author_id: actor.id, status: 'draft' });
    if (!(await mine.clone().first())) return;
    await trx('revision_values').where({ revision_id: id }).delete();
    await mine.delete();
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.discard',
      entity: 'revision',
      entityId: id,
      detail: { reason },
    });
  });
}

/** What a draft from one test holds, as the test's kind makes it. */
export interface TestDraft {
  source: TestSource;
  /** added to the source's audit detail, naming the test */
  sourceDetail: Record<string, unknown>;
  summary: string;
  /** the draft's values from the published ones: the test's added, or replacing its earlier */
  values: (published: RevisionValue[]) => RevisionValueInput[];
  /** the audit reason when a failed start discards the new draft */
  discardReason: string;
}

/**
 * Start a draft revision of the test's cultivar holding the kind's values from it, citing the
 * test's source, and record it on the test. An editable draft already made from the test by the
 * same actor is reused (created: false).
 */
export async function startDraftFromTest<T extends UploadedTestRecord>(
  actor: Actor,
  kind: TestKind,
  load: () => Promise<T>,
  plan: (test: T) => TestDraft,
): Promise<{ revisionId: number; created: boolean }> {
  assertCan(actor, 'lab-tests:upload');
  assertCan(actor, 'revisions:edit');
  const test = await load();
  const open = await openDraftOf(actor, test.draftRevisionId);
  if (open !== null) return { revisionId: open, created: false };
  const draft = plan(test);
  await ensureTestSource(actor, draft.source, draft.sourceDetail);
  const revision = await createDraft(actor, test.cultivar.slug, draft.summary);
  try {
    const { values } = await getRevision(actor, revision.id);
    await updateDraft(actor, revision.id, { summary: draft.summary, values: draft.values(values) });
    await db.transaction(async (trx) => {
      await trx(kind.table).where({ id: test.id }).update({ draft_revision_id: revision.id });
      await recordAudit(trx, {
        actorId: actor.id,
        action: kind.draftAction,
        entity: kind.entity,
        entityId: test.id,
        detail: { revision: revision.id, cultivar: test.cultivar.slug },
      });
    });
  } catch (error) {
    await discardDraft(actor, revision.id, draft.discardReason).catch((e) =>
      console.error(`could not discard draft ${revision.id}`, e),
    );
    throw error;
  }
  return { revisionId: revision.id, created: true };
}
