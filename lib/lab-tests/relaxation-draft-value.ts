import type { RevisionValue } from '@/lib/properties/records';
import type { RevisionValueInput } from '@/lib/validation/revisions';
import { toValueInput } from './draft-value';
import { uploadedTestSource, type UploadedTestFacts } from './test-source';

export const RELAXATION_METHOD = 'Stress relaxation at held deformation, Peleg fit';

/** What the draft needs to know about a stored relaxation test. */
export interface RelaxationTestFacts extends UploadedTestFacts {
  k1S: number;
  k2: number;
  f0N: number;
  r2Force: number;
  r2Linear: number;
  deformationMm: number;
  specimen: string;
  loadingRate: string | null;
  temperatureC: number | null;
  /** readings the fit used, when the stored file could be read back */
  pointsUsed: number | null;
}

const sig = (x: number, n = 3) => String(Number(x.toPrecision(n)));

/**
 * The one source both constants cite: the squeeze check takes k₁ and k₂ as a pair from a single
 * source, so they must never be split between two. A report, or 'demo' for the demo file.
 */
export function relaxationTestSource(test: RelaxationTestFacts) {
  return uploadedTestSource(test, {
    prefix: 'relax-test',
    what: 'stress-relaxation test',
    invented: 'readings',
  });
}

function fitNote(test: RelaxationTestFacts): string {
  const points = test.pointsUsed === null ? '' : `, ${test.pointsUsed} points`;
  return (
    `Held at ${sig(test.deformationMm)} mm plate travel; F₀ = ${sig(test.f0N)} N; ` +
    `R² = ${test.r2Force.toFixed(4)} (force), ${test.r2Linear.toFixed(4)} (linear form)${points}.`
  );
}

/** The k₁ and k₂ a test adds to a draft, both citing its source. */
export function relaxationValues(test: RelaxationTestFacts): RevisionValueInput[] {
  const shared = {
    variant: '',
    low: null,
    high: null,
    sd: null,
    samples: 1,
    method: RELAXATION_METHOD,
    ripeness: null,
    temperature: test.temperatureC === null ? null : `${test.temperatureC} °C`,
    storage: null,
    loadingRate: test.loadingRate,
    probe: test.specimen,
    note: fitNote(test),
    stage: null,
    observation: null,
    isTypicalDefault: false,
    typicalBasis: null,
    sourceKey: relaxationTestSource(test).key,
  };
  return [
    { ...shared, quantity: 'relaxation_k1', value: Number(test.k1S.toPrecision(4)) },
    { ...shared, quantity: 'relaxation_k2', value: Number(test.k2.toPrecision(4)) },
  ];
}

const RELAXATION_QUANTITIES: readonly string[] = ['relaxation_k1', 'relaxation_k2'];

/** The published values with this test's k₁ and k₂ added, or replacing its earlier pair. */
export function valuesWithRelaxationTest(values: RevisionValue[], test: RelaxationTestFacts) {
  const key = relaxationTestSource(test).key;
  const kept = values.filter(
    (v) => !(RELAXATION_QUANTITIES.includes(v.quantity) && v.source?.key === key),
  );
  return [...kept.map(toValueInput), ...relaxationValues(test)];
}
