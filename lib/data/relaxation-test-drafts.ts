import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import {
  relaxationTestSource,
  valuesWithRelaxationTest,
  type RelaxationTestFacts,
} from '@/lib/lab-tests/relaxation-draft-value';
import {
  getRelaxationTest,
  RELAXATION_TESTS,
  type RelaxationTestWithData,
} from './relaxation-tests';
import { startDraftFromTest, uploadedFacts } from './test-draft-steps';

function factsOf(test: RelaxationTestWithData): RelaxationTestFacts {
  return {
    ...uploadedFacts(test),
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
export function createDraftFromRelaxationTest(actor: Actor, testId: number) {
  return startDraftFromTest(
    actor,
    RELAXATION_TESTS,
    () => getRelaxationTest(actor, testId),
    (test) => {
      const facts = factsOf(test);
      return {
        source: relaxationTestSource(facts),
        sourceDetail: { relaxationTest: facts.id },
        summary: `Relaxation constants from in-house relaxation test #${test.id}`,
        values: (published) => valuesWithRelaxationTest(published, facts),
        discardReason: 'starting it from a relaxation test failed',
      };
    },
  );
}
