import 'server-only';
import { randomUUID } from 'node:crypto';
import { sql, type Selectable, type SelectQueryBuilder } from 'kysely';
import type { z } from 'zod';
import { db } from '@/lib/db';
import type { Database, UploadedTestColumns } from '@/lib/db-schema';
import { insertedId, toBool, toIso } from '@/lib/db-values';
import type { Actor } from '@/lib/auth/actor';
import { NotFoundError, ValidationError, type FieldErrors } from '@/lib/errors';
import { fieldErrorsOf } from '@/lib/validation/parse';
import { deleteObject, getObject, putObject } from '@/lib/storage/object-store';
import { recordAudit } from '@/lib/audit-trail';
import { cultivarIdBySlug } from './cultivars';

/** One kind of lab-test upload: its table, where its files go, and its names in the audit log. */
export interface TestKind {
  table: 'compression_tests' | 'relaxation_tests';
  /** the bucket folder, one subfolder per cultivar */
  folder: string;
  entity: string;
  uploadAction: string;
  draftAction: string;
}

/** A kind's tests as `t` with every column selected; each caller names its own table. */
type TestsFrom<T extends UploadedTestColumns, O> = SelectQueryBuilder<Database & { t: T }, 't', O>;

// Kysely cannot type a comparison with a value on a table only known as generic; the common
// columns are numbers, named by a plain reference (the SQL is the same as a typed one).
const column = (name: 't.id' | 't.cultivar_id') => sql.ref<number>(name);

function withCultivarAndUploader<T extends UploadedTestColumns, O>(from: TestsFrom<T, O>) {
  return from
    .innerJoin('cultivars as c', 'c.id', 't.cultivar_id')
    .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
    .innerJoin('users as u', 'u.id', 't.uploaded_by')
    .select(['c.slug as c_slug', 'c.name as c_name', 'm.name as m_name', 'u.name as u_name']);
}

/** Tests, newest first, optionally of one cultivar (404 if that cultivar is unknown). */
export async function listUploadedTests<T extends UploadedTestColumns, O>(
  from: TestsFrom<T, O>,
  filter: { cultivarSlug?: string },
) {
  let query = withCultivarAndUploader(from).orderBy('t.id', 'desc').limit(500);
  if (filter.cultivarSlug !== undefined) {
    const cultivar = await cultivarIdBySlug(filter.cultivarSlug);
    query = query.where(column('t.cultivar_id'), '=', cultivar.id);
  }
  return query.execute();
}

/** One test by id, or a 404 with the kind's message. */
export async function findUploadedTest<T extends UploadedTestColumns, O>(
  from: TestsFrom<T, O>,
  id: number,
  notFound: string,
) {
  const row = await withCultivarAndUploader(from).where(column('t.id'), '=', id).executeTakeFirst();
  if (!row) throw new NotFoundError(notFound);
  return row;
}

/** What every test record holds besides its own figures. */
export interface UploadedTestRecord {
  id: number;
  cultivar: { id: number; slug: string; name: string; commodityName: string };
  uploadedBy: { id: number; name: string };
  fileName: string;
  rows: number;
  isDemo: boolean;
  draftRevisionId: number | null;
  createdAt: string;
}

/** A test row as listed and found: every column, with its cultivar's and uploader's names. */
export type UploadedTestRow<T extends UploadedTestColumns = UploadedTestColumns> = Selectable<T> &
  Record<'c_slug' | 'c_name' | 'm_name' | 'u_name', string>;

/** A test row as a record: who uploaded which file, the test's own figures, then its draft. */
export function uploadedTestRecord<F extends object>(
  r: UploadedTestRow,
  figures: F,
): UploadedTestRecord & F {
  return {
    id: r.id,
    cultivar: { id: r.cultivar_id, slug: r.c_slug, name: r.c_name, commodityName: r.m_name },
    uploadedBy: { id: r.uploaded_by, name: r.u_name },
    fileName: r.file_name,
    rows: r.rows,
    ...figures,
    isDemo: toBool(r.is_demo),
    draftRevisionId: r.draft_revision_id,
    createdAt: toIso(r.created_at),
  };
}

/** The stored file read back by `read`; null, with the reason logged, if it cannot be. */
export async function readStoredFile<D>(
  storageKey: string,
  what: string,
  read: (bytes: Uint8Array) => D,
): Promise<D | null> {
  try {
    const object = await getObject(storageKey);
    if (!object) return null;
    return read(object.body);
  } catch (error) {
    console.error(`${what}: the stored file could not be read`, error);
    return null;
  }
}

/**
 * Field and file checks together, so one answer names every problem: the fields by `schema`, the
 * file by `readFile`, whose ValidationError joins the field errors.
 */
export function checkUpload<S extends z.ZodType, F>(
  schema: S,
  fields: unknown,
  readFile: () => F,
): { fields: z.output<S>; file: F } {
  const errors: FieldErrors = {};
  const parsed = schema.safeParse(fields);
  if (!parsed.success) Object.assign(errors, fieldErrorsOf(parsed.error));
  let file: { read: F } | null = null;
  let fileMessage: string | null = null;
  try {
    file = { read: readFile() };
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    fileMessage = error.message;
    Object.assign(errors, error.fieldErrors);
  }
  if (!parsed.success || !file) {
    throw new ValidationError(fileMessage ?? 'Some fields are not valid.', errors);
  }
  return { fields: parsed.data, file: file.read };
}

export interface TestUpload {
  cultivarSlug: string;
  fileName: string;
  bytes: Uint8Array;
  /** the form's text fields, as the kind's upload schema takes them */
  fields: unknown;
}

/**
 * Store a checked upload's file and record the test with its audit row. Nothing is stored on any
 * refusal: the caller stores only after every check, and the object is deleted again if the
 * transaction fails. `columns` and `detail` are the kind's own, after the common ones.
 */
export async function storeUploadedTest(
  actor: Actor,
  kind: TestKind,
  cultivarId: number,
  upload: TestUpload,
  record: { rows: number; columns: Record<string, unknown>; detail: Record<string, unknown> },
): Promise<number> {
  const { rows } = record;
  const key = `${kind.folder}/${cultivarId}/${randomUUID()}.csv`;
  await putObject(key, Buffer.from(upload.bytes), 'text/csv; charset=utf-8');
  try {
    return await db.transaction(async (trx) => {
      const [inserted] = await trx(kind.table)
        .insert({
          cultivar_id: cultivarId,
          uploaded_by: actor.id,
          storage_key: key,
          file_name: upload.fileName,
          rows,
          ...record.columns,
          created_at: new Date(),
        })
        .returning('id');
      const testId = insertedId(inserted);
      await recordAudit(trx, {
        actorId: actor.id,
        action: kind.uploadAction,
        entity: kind.entity,
        entityId: testId,
        detail: { cultivar: upload.cultivarSlug, file: upload.fileName, rows, ...record.detail },
      });
      return testId;
    });
  } catch (error) {
    await deleteObject(key).catch((e) => console.error(`could not delete ${key}`, e));
    throw error;
  }
}
