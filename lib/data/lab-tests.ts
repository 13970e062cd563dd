import 'server-only';
import { randomUUID } from 'node:crypto';
import type { InferResult } from 'kysely';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { insertedId, toBool, toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { NotFoundError, ValidationError, type FieldErrors } from '@/lib/errors';
import { fitCompressionCurve, type CompressionFit, type SampleGeometry } from '@/lib/lab-tests/fit';
import { parseCompressionCsv, type CurvePoint } from '@/lib/lab-tests/parse-curve';
import { labTestUploadSchema, geometryOf } from '@/lib/lab-tests/upload-schema';
import { fieldErrorsOf } from '@/lib/validation/parse';
import { deleteObject, getObject, putObject } from '@/lib/storage/object-store';
import { recordAudit } from '@/lib/audit-trail';
import { cultivarIdBySlug } from './cultivars';

export interface LabTestRecord {
  id: number;
  cultivar: { id: number; slug: string; name: string; commodityName: string };
  uploadedBy: { id: number; name: string };
  fileName: string;
  rows: number;
  geometry: SampleGeometry;
  poisson: number;
  modulusMpa: number;
  rSquared: number;
  fitFromMm: number;
  fitToMm: number;
  isDemo: boolean;
  draftRevisionId: number | null;
  createdAt: string;
}

export interface LabTestWithData extends LabTestRecord {
  /** the readings and the fit as recomputed from the stored file; null if it cannot be read */
  points: CurvePoint[] | null;
  fit: CompressionFit | null;
}

function testQuery() {
  return typed()
    .selectFrom('compression_tests as t')
    .innerJoin('cultivars as c', 'c.id', 't.cultivar_id')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .innerJoin('users as u', 'u.id', 't.uploaded_by')
    .selectAll('t')
    .select(['c.slug as c_slug', 'c.name as c_name', 'm.name as m_name', 'u.name as u_name']);
}

function toRecord(r: InferResult<ReturnType<typeof testQuery>>[number]): LabTestRecord {
  // A test has a diameter or both radii (the upload schema refuses anything else).
  const geometry: SampleGeometry =
    r.diameter_mm !== null
      ? { kind: 'sphere', diameterMm: r.diameter_mm }
      : { kind: 'radii', radiiMm: [r.radius1_mm ?? 0, r.radius2_mm ?? 0] };
  return {
    id: r.id,
    cultivar: { id: r.cultivar_id, slug: r.c_slug, name: r.c_name, commodityName: r.m_name },
    uploadedBy: { id: r.uploaded_by, name: r.u_name },
    fileName: r.file_name,
    rows: r.rows,
    geometry,
    poisson: r.poisson,
    modulusMpa: r.modulus_mpa,
    rSquared: r.r_squared,
    fitFromMm: r.fit_from_mm,
    fitToMm: r.fit_to_mm,
    isDemo: toBool(r.is_demo),
    draftRevisionId: r.draft_revision_id,
    createdAt: toIso(r.created_at),
  };
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
  let query = testQuery().orderBy('t.id', 'desc').limit(500);
  if (filter.cultivarSlug !== undefined) {
    const cultivar = await cultivarIdBySlug(filter.cultivarSlug);
    query = query.where('t.cultivar_id', '=', cultivar.id);
  }
  return (await query.execute()).map(toRecord);
}

/** One test with its readings read back from the bucket and the fit recomputed from them. */
export async function getLabTest(actor: Actor, id: number): Promise<LabTestWithData> {
  assertCan(actor, 'lab-tests:upload');
  const row = await testQuery().where('t.id', '=', id).executeTakeFirst();
  if (!row) throw new NotFoundError('No such lab test.');
  const record = toRecord(row);
  try {
    const object = await getObject(row.storage_key);
    if (!object) return { ...record, points: null, fit: null };
    const { points } = parseCompressionCsv(object.body);
    return { ...record, points, fit: fitCompressionCurve(points, record.geometry, record.poisson) };
  } catch (error) {
    console.error(`lab test ${id}: the stored file could not be read`, error);
    return { ...record, points: null, fit: null };
  }
}

export interface LabTestUpload {
  cultivarSlug: string;
  fileName: string;
  bytes: Uint8Array;
  /** the form's text fields: diameterMm or radius1Mm/radius2Mm, poisson */
  fields: unknown;
}

/** Field and file checks together, so one answer names every problem. */
function validateUpload(upload: LabTestUpload) {
  const errors: FieldErrors = {};
  const fields = labTestUploadSchema.safeParse(upload.fields);
  if (!fields.success) Object.assign(errors, fieldErrorsOf(fields.error));
  let curve: ReturnType<typeof parseCompressionCsv> | null = null;
  let fileMessage: string | null = null;
  try {
    curve = parseCompressionCsv(upload.bytes);
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    fileMessage = error.message;
    Object.assign(errors, error.fieldErrors);
  }
  if (!fields.success || !curve) {
    throw new ValidationError(fileMessage ?? 'Some fields are not valid.', errors);
  }
  const geometry = geometryOf(fields.data);
  const fit = fitCompressionCurve(curve.points, geometry, fields.data.poisson);
  return { geometry, poisson: fields.data.poisson, rows: curve.rows, fit };
}

/**
 * Validate, fit, store the file and record the test. Nothing is stored on any refusal: the
 * object is written only after every check, and deleted again if the transaction fails.
 */
export async function createLabTest(actor: Actor, upload: LabTestUpload) {
  assertCan(actor, 'lab-tests:upload');
  const cultivar = await cultivarIdBySlug(upload.cultivarSlug);
  const { geometry, poisson, rows, fit } = validateUpload(upload);
  const key = `lab-tests/${cultivar.id}/${randomUUID()}.csv`;
  await putObject(key, Buffer.from(upload.bytes), 'text/csv; charset=utf-8');
  try {
    const id = await db.transaction(async (trx) => {
      const [inserted] = await trx('compression_tests')
        .insert({
          cultivar_id: cultivar.id,
          uploaded_by: actor.id,
          storage_key: key,
          file_name: upload.fileName,
          rows,
          diameter_mm: geometry.kind === 'sphere' ? geometry.diameterMm : null,
          radius1_mm: geometry.kind === 'radii' ? geometry.radiiMm[0] : null,
          radius2_mm: geometry.kind === 'radii' ? geometry.radiiMm[1] : null,
          poisson,
          modulus_mpa: fit.modulusMpa,
          r_squared: fit.rSquared,
          fit_from_mm: fit.fromMm,
          fit_to_mm: fit.toMm,
          is_demo: false,
          created_at: new Date(),
        })
        .returning('id');
      const testId = insertedId(inserted);
      await recordAudit(trx, {
        actorId: actor.id,
        action: 'compression-test.upload',
        entity: 'compression_test',
        entityId: testId,
        detail: {
          cultivar: upload.cultivarSlug,
          file: upload.fileName,
          rows,
          modulusMpa: Number(fit.modulusMpa.toPrecision(4)),
          rSquared: Number(fit.rSquared.toFixed(4)),
        },
      });
      return testId;
    });
    return { id, modulusMpa: fit.modulusMpa, rSquared: fit.rSquared, fit };
  } catch (error) {
    await deleteObject(key).catch((e) => console.error(`could not delete ${key}`, e));
    throw error;
  }
}
