import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import {
  relaxationTestSource,
  valuesWithRelaxationTest,
  type RelaxationTestFacts,
} from '@/lib/lab-tests/relaxation-draft-value';
import { recordAudit } from '@/lib/audit-trail';
import { getRevision } from './cultivars';
import { getRelaxationTest, type RelaxationTestWithData } from './relaxation-tests';
import { createDraft, updateDraft } from './revisions';
import { discardDraft, ensureTestSource, openDraftOf } from './test-draft-steps';

function factsOf(test: RelaxationTestWithData): RelaxationTestFacts {
  return {
    id: test.id,
    createdAt: test.createdAt,
    uploaderName: test.uploadedBy.name,
    isDemo: test.isDemo,
    k1S: test.k1S,
    k2: test.k2,
    f0N: test.f0N,
    r2Force: test.r2Force,
    r2Linear: test.r2Linear,
    deformationMm: test.deformationMm,
    specimen: test.specimen,
    loadingRate: test.loadingRate,
    temperatureC: test.temperatureC,
    pointsUsed: test.fit?.points ?? null,
  };
}

/**
 * Start a draft revision of the test's cultivar: the published values plus this test's k₁ and
 * k₂ (replacing a pair from the same test), both citing the test's one source. An editable draft
 * already made from the test by the same editor is reused.
 */
export async function createDraftFromRelaxationTest(actor: Actor, testId: number) {
  assertCan(actor, 'lab-tests:upload');
  assertCan(actor, 'revisions:edit');
  const test = await getRelaxationTest(actor, testId);
  const open = await openDraftOf(actor, test.draftRevisionId);
  if (open !== null) return { revisionId: open, created: false };
  const facts = factsOf(test);
  await ensureTestSource(actor, relaxationTestSource(facts), { relaxationTest: facts.id });
  const summary = `Relaxation constants from in-house relaxation test #${test.id}`;
  const draft = await createDraft(actor, test.cultivar.slug, summary);
  try {
    const { values } = await getRevision(actor, draft.id);
    await updateDraft(actor, draft.id, {
      summary,
      values: valuesWithRelaxationTest(values, facts),
    });
    await db.transaction(async (trx) => {
      await trx('relaxation_tests').where({ id: test.id }).update({ draft_revision_id: draft.id });
      await recordAudit(trx, {
        actorId: actor.id,
        action: 'relaxation-test.draft',
        entity: 'relaxation_test',
        entityId: test.id,
        detail: { revision: draft.id, cultivar: test.cultivar.slug },
      });
    });
  } catch (error) {
    await discardDraft(actor, draft.id, 'starting it from a relaxation test failed').catch((e) =>
      console.error(`could not discard draft ${draft.id}`, e),
    );
    throw error;
  }
  return { revisionId: draft.id, created: true };
}
