import 'server-only';
import { typed } from '@/lib/db-kysely';
import type { RelaxationTestsTable } from '@/lib/db-schema';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { parseRelaxationCsv, type RelaxationReading } from '@/lib/lab-tests/relaxation-csv';
import { isRelaxationDemoFile } from '@/lib/lab-tests/relaxation-demo';
import { fitRelaxation, type RelaxationFit } from '@/lib/lab-tests/relaxation-fit';
import { relaxationUploadSchema } from '@/lib/lab-tests/relaxation-schema';
import { cultivarIdBySlug } from './cultivars';
import {
  checkUpload,
  findUploadedTest,
  listUploadedTests,
  readStoredFile,
  storeUploadedTest,
  uploadedTestRecord,
  type TestKind,
  type TestUpload,
  type UploadedTestRecord,
  type UploadedTestRow,
} from './uploaded-tests';

export const RELAXATION_TESTS: TestKind = {
  table: 'relaxation_tests',
  folder: 'relaxation-tests',
  entity: 'relaxation_test',
  uploadAction: 'relaxation-test.upload',
  draftAction: 'relaxation-test.draft',
};

export interface RelaxationTestRecord extends UploadedTestRecord {
  deformationMm: number;
  specimen: string;
  loadingRate: string | null;
  temperatureC: number | null;
  f0N: number;
  k1S: number;
  k2: number;
  r2Linear: number;
  r2Force: number;
}

export interface RelaxationTestWithData extends RelaxationTestRecord {
  /** the readings and the fit as recomputed from the stored file; null if it cannot be read */
  readings: RelaxationReading[] | null;
  fit: RelaxationFit | null;
}

const tests = () => typed().selectFrom('relaxation_tests as t').selectAll('t');

function toRecord(r: UploadedTestRow<RelaxationTestsTable>): RelaxationTestRecord {
  return uploadedTestRecord(r, {
    deformationMm: r.deformation_mm,
    specimen: r.specimen,
    loadingRate: r.loading_rate,
    temperatureC: r.temperature_c,
    f0N: r.f0_n,
    k1S: r.k1_s,
    k2: r.k2,
    r2Linear: r.r2_linear,
    r2Force: r.r2_force,
  });
}

/** Relaxation tests, newest first, optionally of one cultivar (404 if that cultivar is unknown). */
export async function listRelaxationTests(actor: Actor, filter: { cultivarSlug?: string } = {}) {
  assertCan(actor, 'lab-tests:upload');
  return (await listUploadedTests(tests(), filter)).map(toRecord);
}

/** One test with its readings read back from the bucket and Peleg's fit recomputed from them. */
export async function getRelaxationTest(actor: Actor, id: number): Promise<RelaxationTestWithData> {
  assertCan(actor, 'lab-tests:upload');
  const row = await findUploadedTest(tests(), id, 'No such relaxation test.');
  const data = await readStoredFile(row.storage_key, `relaxation test ${id}`, (bytes) => {
    const { readings } = parseRelaxationCsv(bytes);
    return { readings, fit: fitRelaxation(readings) };
  });
  return { ...toRecord(row), ...(data ?? { readings: null, fit: null }) };
}

/**
 * Validate, fit, store the file and record the test (the upload's fields: deformationMm,
 * specimen, loadingRate, temperatureC). Nothing is stored on any refusal: the object is written
 * only after every check, and deleted again if the transaction fails.
 */
export async function createRelaxationTest(actor: Actor, upload: TestUpload) {
  assertCan(actor, 'lab-tests:upload');
  const cultivar = await cultivarIdBySlug(upload.cultivarSlug);
  const { fields, file } = checkUpload(relaxationUploadSchema, upload.fields, () => {
    const { readings, rows } = parseRelaxationCsv(upload.bytes);
    return { rows, fit: fitRelaxation(readings) };
  });
  const { rows, fit } = file;
  const isDemo = isRelaxationDemoFile(upload.bytes);
  const id = await storeUploadedTest(actor, RELAXATION_TESTS, cultivar.id, upload, {
    rows,
    columns: {
      deformation_mm: fields.deformationMm,
      specimen: fields.specimen,
      loading_rate: fields.loadingRate ?? null,
      temperature_c: fields.temperatureC ?? null,
      f0_n: fit.f0,
      k1_s: fit.k1,
      k2: fit.k2,
      r2_linear: fit.r2Linear,
      r2_force: fit.r2Force,
      is_demo: isDemo,
    },
    detail: {
      k1S: Number(fit.k1.toPrecision(4)),
      k2: Number(fit.k2.toPrecision(4)),
      r2Force: Number(fit.r2Force.toFixed(4)),
      demo: isDemo,
    },
  });
  return { id, isDemo, fit };
}
