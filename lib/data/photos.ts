import 'server-only';
import type { Selectable } from 'kysely';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import type { ImagesTable } from '@/lib/db-schema';
import { toBool, toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { NotFoundError } from '@/lib/errors';
import { variantKey, type VariantName } from '@/lib/photos/limits';
import type { PhotoRecord } from '@/lib/photos/record';
import { storePhoto, type PhotoBucket } from '@/lib/photos/store';
import { cultivarIdBySlug } from './cultivars';
import { deleteObject, getObject, putObject } from '@/lib/storage/object-store';

const bucket: PhotoBucket = { put: putObject, remove: deleteObject };

function toPhoto(r: Selectable<ImagesTable>): PhotoRecord {
  return {
    id: r.id,
    caption: r.caption,
    credit: r.credit,
    isDemo: toBool(r.is_demo),
    width: r.width,
    height: r.height,
    bytes: r.bytes,
    originalType: r.original_type,
    createdAt: toIso(r.created_at),
  };
}

/** One photo's row; 404 when unknown. */
async function photoRow(id: number) {
  const row = await typed()
    .selectFrom('images')
    .selectAll()
    .where('id', '=', id)
    .executeTakeFirst();
  if (!row) throw new NotFoundError('No such photo.');
  return row;
}

/** A cultivar's photos, oldest first. */
export async function listCultivarPhotos(actor: Actor, slug: string): Promise<PhotoRecord[]> {
  assertCan(actor, 'properties:read-published');
  const cultivar = await cultivarIdBySlug(slug);
  const rows = await typed()
    .selectFrom('images')
    .selectAll()
    .where('cultivar_id', '=', cultivar.id)
    .orderBy('created_at')
    .orderBy('id')
    .execute();
  return rows.map(toPhoto);
}

/** Check, convert and store an uploaded photo of a cultivar (never a demo photo). */
export async function createCultivarPhoto(
  actor: Actor,
  slug: string,
  input: { bytes: Buffer; caption: string | null; credit: string | null },
): Promise<PhotoRecord> {
  assertCan(actor, 'images:upload');
  const cultivar = await cultivarIdBySlug(slug);
  const id = await storePhoto(db, bucket, {
    ...input,
    cultivarId: cultivar.id,
    cultivarSlug: cultivar.slug,
    isDemo: false,
    uploadedBy: actor.id,
  });
  return toPhoto(await photoRow(id));
}

/** The WebP bytes of one variant of a photo; 404 when the photo or its object is missing. */
export async function getPhotoVariant(
  actor: Actor,
  id: number,
  variant: VariantName,
): Promise<Buffer> {
  assertCan(actor, 'properties:read-published');
  const row = await photoRow(id);
  const object = await getObject(variantKey(row.storage_prefix, variant));
  if (!object) throw new NotFoundError('The photo file is missing from storage.');
  return object.body;
}
