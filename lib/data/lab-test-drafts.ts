import 'server-only';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { labTestSource, valuesWithLabTest, type LabTestFacts } from '@/lib/lab-tests/draft-value';
import { recordAudit } from '@/lib/audit-trail';
import { getRevision } from './cultivars';
import { getLabTest, type LabTestWithData } from './lab-tests';
import { createDraft, updateDraft } from './revisions';

function factsOf(test: LabTestWithData): LabTestFacts {
  return {
    id: test.id,
    createdAt: test.createdAt,
    uploaderName: test.uploadedBy.name,
    isDemo: test.isDemo,
    modulusMpa: test.modulusMpa,
    rSquared: test.rSquared,
    fitFromMm: test.fitFromMm,
    fitToMm: test.fitToMm,
    pointsUsed: test.fit?.pointsUsed ?? null,
    diameterMm: test.geometry.kind === 'sphere' ? test.geometry.diameterMm : null,
    radiiMm: test.geometry.kind === 'radii' ? [...test.geometry.radiiMm] : null,
    poisson: test.poisson,
  };
}

/** The test's source, created once (with its audit row) and reused by later drafts. */
async function ensureSource(actor: Actor, facts: LabTestFacts): Promise<void> {
  const source = labTestSource(facts);
  await db.transaction(async (trx) => {
    if (await trx('sources').where({ key: source.key }).first()) return;
    await trx('sources').insert({ ...source, created_at: new Date() });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'source.create',
      entity: 'source',
      entityId: source.key,
      detail: { kind: source.kind, compressionTest: facts.id },
    });
  });
}

/** An editable draft of this actor's already made from the test, if any. */
async function openDraftOf(actor: Actor, test: LabTestWithData): Promise<number | null> {
  if (test.draftRevisionId === null) return null;
  const row = await typed()
    .selectFrom('property_revisions')
    .select('id')
    .where('id', '=', test.draftRevisionId)
    .where('author_id', '=', actor.id)
    .where('status', 'in', ['draft', 'returned'])
    .executeTakeFirst();
  return row ? row.id : null;
}

// createDraft and updateDraft each commit on their own; if a later step fails, the new draft is
// removed again so no half-made draft is left behind.
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

/**
 * Start a draft revision of the test's cultivar: the published values plus this test's apparent
 * modulus (replacing one from the same test), citing a source for the test. An editable draft
 * already made from the test by the same editor is reused.
 */
export async function createDraftFromLabTest(actor: Actor, testId: number) {
  assertCan(actor, 'lab-tests:upload');
  assertCan(actor, 'revisions:edit');
  const test = await getLabTest(actor, testId);
  const open = await openDraftOf(actor, test);
  if (open !== null) return { revisionId: open, created: false };
  const facts = factsOf(test);
  await ensureSource(actor, facts);
  const summary = `Apparent modulus from in-house compression test #${test.id}`;
  const draft = await createDraft(actor, test.cultivar.slug, summary);
  try {
    const { values } = await getRevision(actor, draft.id);
    await updateDraft(actor, draft.id, { summary, values: valuesWithLabTest(values, facts) });
    await db.transaction(async (trx) => {
      await trx('compression_tests').where({ id: test.id }).update({ draft_revision_id: draft.id });
      await recordAudit(trx, {
        actorId: actor.id,
        action: 'compression-test.draft',
        entity: 'compression_test',
        entityId: test.id,
        detail: { revision: draft.id, cultivar: test.cultivar.slug },
      });
    });
  } catch (error) {
    await discardDraft(actor, draft.id, 'starting it from a lab test failed').catch((e) =>
      console.error(`could not discard draft ${draft.id}`, e),
    );
    throw error;
  }
  return { revisionId: draft.id, created: true };
}
