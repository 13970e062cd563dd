import 'server-only';
import { typed } from '@/lib/db-kysely';
import type { CompressionTestsTable } from '@/lib/db-schema';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { fitCompressionCurve, type CompressionFit, type SampleGeometry } from '@/lib/lab-tests/fit';
import { parseCompressionCsv, type CurvePoint } from '@/lib/lab-tests/parse-curve';
import { labTestUploadSchema, geometryOf } from '@/lib/lab-tests/upload-schema';
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

export const COMPRESSION_TESTS: TestKind = {
  table: 'compression_tests',
  folder: 'lab-tests',
  entity: 'compression_test',
  uploadAction: 'compression-test.upload',
  draftAction: 'compression-test.draft',
};

export interface LabTestRecord extends UploadedTestRecord {
  geometry: SampleGeometry;
  poisson: number;
  modulusMpa: number;
  rSquared: number;
  fitFromMm: number;
  fitToMm: number;
}

export interface LabTestWithData extends LabTestRecord {
  /** the readings and the fit as recomputed from the stored file; null if it cannot be read */
  points: CurvePoint[] | null;
  fit: CompressionFit | null;
}

const tests = () => typed().selectFrom('compression_tests as t').selectAll('t');

function toRecord(r: UploadedTestRow<CompressionTestsTable>): LabTestRecord {
  // A test has a diameter or both radii (the upload schema refuses anything else).
  const geometry: SampleGeometry =
    r.diameter_mm !== null
      ? { kind: 'sphere', diameterMm: r.diameter_mm }
      : { kind: 'radii', radiiMm: [r.radius1_mm ?? 0, r.radius2_mm ?? 0] };
  return uploadedTestRecord(r, {
    geometry,
    poisson: r.poisson,
    modulusMpa: r.modulus_mpa,
    rSquared: r.r_squared,
    fitFromMm: r.fit_from_mm,
    fitToMm: r.fit_to_mm,
  });
}

/** Every cultivar a test may be uploaded for (published or not), by commodity and name. */
export async function listCultivarChoices(actor: Actor) {
  assertCan(actor, 'lab-tests:upload');
  const rows = await typed()
    .selectFrom('cultivars as c')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .orderBy('m.name')
    .orderBy('c.name')
    .select(['c.slug', 'c.name', 'm.name as commodity'])
    .execute();
  return rows.map((r) => ({ slug: r.slug, label: `${r.commodity} — ${r.name}` }));
}

/** Lab tests, newest first, optionally of one cultivar (404 if that cultivar is unknown). */
export async function listLabTests(actor: Actor, filter: { cultivarSlug?: string } = {}) {
  assertCan(actor, 'lab-tests:upload');
  return (await listUploadedTests(tests(), filter)).map(toRecord);
}

/** One test with its readings read back from the bucket and the fit recomputed from them. */
export async function getLabTest(actor: Actor, id: number): Promise<LabTestWithData> {
  assertCan(actor, 'lab-tests:upload');
  const row = await findUploadedTest(tests(), id, 'No such lab test.');
  const record = toRecord(row);
  const data = await readStoredFile(row.storage_key, `lab test ${id}`, (bytes) => {
    const { points } = parseCompressionCsv(bytes);
    return { points, fit: fitCompressionCurve(points, record.geometry, record.poisson) };
  });
  return { ...record, ...(data ?? { points: null, fit: null }) };
}

/**
 * Validate, fit, store the file and record the test (the upload's fields: diameterMm or
 * radius1Mm/radius2Mm, poisson). Nothing is stored on any refusal: the object is written only
 * after every check, and deleted again if the transaction fails.
 */
export async function createLabTest(actor: Actor, upload: TestUpload) {
  assertCan(actor, 'lab-tests:upload');
  const cultivar = await cultivarIdBySlug(upload.cultivarSlug);
  const { fields, file: curve } = checkUpload(labTestUploadSchema, upload.fields, () =>
    parseCompressionCsv(upload.bytes),
  );
  const geometry = geometryOf(fields);
  const fit = fitCompressionCurve(curve.points, geometry, fields.poisson);
  const id = await storeUploadedTest(actor, COMPRESSION_TESTS, cultivar.id, upload, {
    rows: curve.rows,
    columns: {
      diameter_mm: geometry.kind === 'sphere' ? geometry.diameterMm : null,
      radius1_mm: geometry.kind === 'radii' ? geometry.radiiMm[0] : null,
      radius2_mm: geometry.kind === 'radii' ? geometry.radiiMm[1] : null,
      poisson: fields.poisson,
      modulus_mpa: fit.modulusMpa,
      r_squared: fit.rSquared,
      fit_from_mm: fit.fromMm,
      fit_to_mm: fit.toMm,
      is_demo: false,
    },
    detail: {
      modulusMpa: Number(fit.modulusMpa.toPrecision(4)),
      rSquared: Number(fit.rSquared.toFixed(4)),
    },
  });
  return { id, modulusMpa: fit.modulusMpa, rSquared: fit.rSquared, fit };
}
