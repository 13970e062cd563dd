import type { RevisionValue } from '@/lib/properties/records';
import type { RevisionValueInput } from '@/lib/validation/revisions';
import { FIT_STRAIN } from './limits';
import { uploadedTestSource, type UploadedTestFacts } from './test-source';

export const LAB_TEST_METHOD = 'Parallel-plate compression, Hertz fit (ASAE S368)';

/** What the draft needs to know about a stored test. */
export interface LabTestFacts extends UploadedTestFacts {
  modulusMpa: number;
  rSquared: number;
  fitFromMm: number;
  fitToMm: number;
  pointsUsed: number | null;
  diameterMm: number | null;
  radiiMm: [number, number] | null;
  poisson: number;
}

const sig = (x: number, n = 3) => String(Number(x.toPrecision(n)));

/** The source a draft value cites: one per test, a report (demo for demo uploads). */
export function labTestSource(test: LabTestFacts) {
  return uploadedTestSource(test, {
    prefix: 'lab-test',
    what: 'compression test',
    invented: 'curve',
  });
}

function fitNote(test: LabTestFacts): string {
  const size = test.diameterMm
    ? `the ${sig(test.diameterMm)} mm diameter`
    : `2√(R₁R₂) for radii ${sig(test.radiiMm![0])} and ${sig(test.radiiMm![1])} mm`;
  const points = test.pointsUsed === null ? '' : `, ${test.pointsUsed} points`;
  return (
    `Fitted over ${sig(test.fitFromMm)}–${sig(test.fitToMm)} mm plate travel ` +
    `(up to ${FIT_STRAIN * 100} % of ${size})${points}, R² = ${test.rSquared.toFixed(4)}; ` +
    `ν = ${test.poisson} assumed.`
  );
}

/** The apparent-modulus value a test adds to a draft, citing its source. */
export function labTestValue(test: LabTestFacts): RevisionValueInput {
  return {
    quantity: 'youngs_modulus',
    variant: 'apparent',
    value: Number(test.modulusMpa.toPrecision(4)),
    low: null,
    high: null,
    sd: null,
    samples: 1,
    method: LAB_TEST_METHOD,
    ripeness: null,
    temperature: null,
    storage: null,
    loadingRate: null,
    probe: 'Parallel flat plates',
    note: fitNote(test),
    stage: null,
    observation: null,
    isTypicalDefault: false,
    typicalBasis: null,
    sourceKey: labTestSource(test).key,
  };
}

/** A stored value as the draft-update input takes it back. */
export function toValueInput(v: RevisionValue): RevisionValueInput {
  return {
    quantity: v.quantity,
    variant: v.variant,
    value: v.value,
    low: v.low,
    high: v.high,
    sd: v.sd,
    samples: v.samples,
    method: v.method,
    ripeness: v.ripeness,
    temperature: v.temperature,
    storage: v.storage,
    loadingRate: v.loadingRate,
    probe: v.probe,
    note: v.note,
    stage: v.stage,
    observation: v.observation,
    isTypicalDefault: v.isTypicalDefault,
    typicalBasis: v.typicalBasis,
    sourceKey: v.source?.key ?? null,
  };
}

/** The published values with this test's apparent modulus added, or replacing its earlier one. */
export function valuesWithLabTest(values: RevisionValue[], test: LabTestFacts) {
  const key = labTestSource(test).key;
  const kept = values.filter(
    (v) => !(v.quantity === 'youngs_modulus' && v.variant === 'apparent' && v.source?.key === key),
  );
  return [...kept.map(toValueInput), labTestValue(test)];
}
