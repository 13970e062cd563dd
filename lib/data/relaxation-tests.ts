import 'server-only';
import { randomUUID } from 'node:crypto';
import type { InferResult } from 'kysely';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { insertedId, toBool, toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { NotFoundError, ValidationError, type FieldErrors } from '@/lib/errors';
import { parseRelaxationCsv, type RelaxationReading } from '@/lib/lab-tests/relaxation-csv';
import { isRelaxationDemoFile } from '@/lib/lab-tests/relaxation-demo';
import { fitRelaxation, type RelaxationFit } from '@/lib/lab-tests/relaxation-fit';
import { relaxationUploadSchema } from '@/lib/lab-tests/relaxation-schema';
import { fieldErrorsOf } from '@/lib/validation/parse';
import { deleteObject, getObject, putObject } from '@/lib/storage/object-store';
import { recordAudit } from '@/lib/audit-trail';
import { cultivarIdBySlug } from './cultivars';

export interface RelaxationTestRecord {
  id: number;
  cultivar: { id: number; slug: string; name: string; commodityName: string };
  uploadedBy: { id: number; name: string };
  fileName: string;
  rows: number;
  deformationMm: number;
  specimen: string;
  loadingRate: string | null;
  temperatureC: number | null;
  f0N: number;
  k1S: number;
  k2: number;
  r2Linear: number;
  r2Force: number;
  isDemo: boolean;
  draftRevisionId: number | null;
  createdAt: string;
}

export interface RelaxationTestWithData extends RelaxationTestRecord {
  /** the readings and the fit as recomputed from the stored file; null if it cannot be read */
  readings: RelaxationReading[] | null;
  fit: RelaxationFit | null;
}

function testQuery() {
  return typed()
    .selectFrom('relaxation_tests as t')
    .innerJoin('cultivars as c', 'c.id', 't.cultivar_id')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .innerJoin('users as u', 'u.id', 't.uploaded_by')
    .selectAll('t')
    .select(['c.slug as c_slug', 'c.name as c_name', 'm.name as m_name', 'u.name as u_name']);
}

function toRecord(r: InferResult<ReturnType<typeof testQuery>>[number]): RelaxationTestRecord {
  return {
    id: r.id,
    cultivar: { id: r.cultivar_id, slug: r.c_slug, name: r.c_name, commodityName: r.m_name },
    uploadedBy: { id: r.uploaded_by, name: r.u_name },
    fileName: r.file_name,
    rows: r.rows,
    deformationMm: r.deformation_mm,
    specimen: r.specimen,
    loadingRate: r.loading_rate,
    temperatureC: r.temperature_c,
    f0N: r.f0_n,
    k1S: r.k1_s,
    k2: r.k2,
    r2Linear: r.r2_linear,
    r2Force: r.r2_force,
    isDemo: toBool(r.is_demo),
    draftRevisionId: r.draft_revision_id,
    createdAt: toIso(r.created_at),
  };
}

/** Relaxation tests, newest first, optionally of one cultivar (404 if that cultivar is unknown). */
export async function listRelaxationTests(actor: Actor, filter: { cultivarSlug?: string } = {}) {
  assertCan(actor, 'lab-tests:upload');
  let query = testQuery().orderBy('t.id', 'desc').limit(500);
  if (filter.cultivarSlug !== undefined) {
    const cultivar = await cultivarIdBySlug(filter.cultivarSlug);
    query = query.where('t.cultivar_id', '=', cultivar.id);
  }
  return (await query.execute()).map(toRecord);
}

/** One test with its readings read back from the bucket and Peleg's fit recomputed from them. */
export async function getRelaxationTest(actor: Actor, id: number): Promise<RelaxationTestWithData> {
  assertCan(actor, 'lab-tests:upload');
  const row = await testQuery().where('t.id', '=', id).executeTakeFirst();
  if (!row) throw new NotFoundError('No such relaxation test.');
  const record = toRecord(row);
  try {
    const object = await getObject(row.storage_key);
    if (!object) return { ...record, readings: null, fit: null };
    const { readings } = parseRelaxationCsv(object.body);
    return { ...record, readings, fit: fitRelaxation(readings) };
  } catch (error) {
    console.error(`relaxation test ${id}: the stored file could not be read`, error);
    return { ...record, readings: null, fit: null };
  }
}

export interface RelaxationTestUpload {
  cultivarSlug: string;
  fileName: string;
  bytes: Uint8Array;
  /** the form's text fields: deformationMm, specimen, loadingRate, temperatureC */
  fields: unknown;
}

/** Field and file checks together, so one answer names every problem. */
function validateUpload(upload: RelaxationTestUpload) {
  const errors: FieldErrors = {};
  const fields = relaxationUploadSchema.safeParse(upload.fields);
  if (!fields.success) Object.assign(errors, fieldErrorsOf(fields.error));
  let file: { rows: number; fit: RelaxationFit } | null = null;
  let fileMessage: string | null = null;
  try {
    const { readings, rows } = parseRelaxationCsv(upload.bytes);
    file = { rows, fit: fitRelaxation(readings) };
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    fileMessage = error.message;
    Object.assign(errors, error.fieldErrors);
  }
  if (!fields.success || !file) {
    throw new ValidationError(fileMessage ?? 'Some fields are not valid.', errors);
  }
  return { fields: fields.data, ...file };
}

/**
 * Validate, fit, store the file and record the test. Nothing is stored on any refusal: the
 * object is written only after every check, and deleted again if the transaction fails.
 */
export async function createRelaxationTest(actor: Actor, upload: RelaxationTestUpload) {
  assertCan(actor, 'lab-tests:upload');
  const cultivar = await cultivarIdBySlug(upload.cultivarSlug);
  const { fields, rows, fit } = validateUpload(upload);
  const isDemo = isRelaxationDemoFile(upload.bytes);
  const key = `relaxation-tests/${cultivar.id}/${randomUUID()}.csv`;
  await putObject(key, Buffer.from(upload.bytes), 'text/csv; charset=utf-8');
  try {
    const id = await db.transaction(async (trx) => {
      const [inserted] = await trx('relaxation_tests')
        .insert({
          cultivar_id: cultivar.id,
          uploaded_by: actor.id,
          storage_key: key,
          file_name: upload.fileName,
          rows,
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
          created_at: new Date(),
        })
        .returning('id');
      const testId = insertedId(inserted);
      await recordAudit(trx, {
        actorId: actor.id,
        action: 'relaxation-test.upload',
        entity: 'relaxation_test',
        entityId: testId,
        detail: {
          cultivar: upload.cultivarSlug,
          file: upload.fileName,
          rows,
          k1S: Number(fit.k1.toPrecision(4)),
          k2: Number(fit.k2.toPrecision(4)),
          r2Force: Number(fit.r2Force.toFixed(4)),
          demo: isDemo,
        },
      });
      return testId;
    });
    return { id, isDemo, fit };
  } catch (error) {
    await deleteObject(key).catch((e) => console.error(`could not delete ${key}`, e));
    throw error;
  }
}
