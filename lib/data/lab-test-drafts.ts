import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { labTestSource, valuesWithLabTest, type LabTestFacts } from '@/lib/lab-tests/draft-value';
import { COMPRESSION_TESTS, getLabTest, type LabTestWithData } from './lab-tests';
import { startDraftFromTest, uploadedFacts } from './test-draft-steps';

function factsOf(test: LabTestWithData): LabTestFacts {
  return {
    ...uploadedFacts(test),
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

/**
 * Start a draft revision of the test's cultivar: the published values plus this test's apparent
 * modulus (replacing one from the same test), citing a source for the test. An editable draft
 * already made from the test by the same editor is reused.
 */
export function createDraftFromLabTest(actor: Actor, testId: number) {
  return startDraftFromTest(
    actor,
    COMPRESSION_TESTS,
    () => getLabTest(actor, testId),
    (test) => {
      const facts = factsOf(test);
      return {
        source: labTestSource(facts),
        sourceDetail: { compressionTest: facts.id },
        summary: `Apparent modulus from in-house compression test #${test.id}`,
        values: (published) => valuesWithLabTest(published, facts),
        discardReason: 'starting it from a lab test failed',
      };
    },
  );
}
