import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { NotFoundError } from '@/lib/errors';
import { variantKey, type VariantName } from '@/lib/photos/limits';
import type { PhotoRecord } from '@/lib/photos/record';
import { storePhoto, type PhotoBucket } from '@/lib/photos/store';
import { deleteObject, getObject, putObject } from '@/lib/storage/object-store';

const bucket: PhotoBucket = { put: putObject, remove: deleteObject };

function toPhoto(r: Record<string, unknown>): PhotoRecord {
  return {
    id: Number(r.id),
    caption: (r.caption as string | null) ?? null,
    credit: (r.credit as string | null) ?? null,
    isDemo: Boolean(r.is_demo),
    width: Number(r.width),
    height: Number(r.height),
    bytes: Number(r.bytes),
    originalType: String(r.original_type),
    createdAt: new Date(r.created_at as string | number | Date).toISOString(),
  };
}

async function cultivarOf(slug: string) {
  const cultivar = await db('cultivars').where({ slug }).first();
  if (!cultivar) throw new NotFoundError(`No cultivar "${slug.slice(0, 80)}".`);
  return cultivar as { id: number; slug: string };
}

/** A cultivar's photos, oldest first. */
export async function listCultivarPhotos(actor: Actor, slug: string): Promise<PhotoRecord[]> {
  assertCan(actor, 'properties:read-published');
  const cultivar = await cultivarOf(slug);
  const rows = await db('images').where({ cultivar_id: cultivar.id }).orderBy(['created_at', 'id']);
  return rows.map(toPhoto);
}

/** Check, convert and store an uploaded photo of a cultivar (never a demo photo). */
export async function createCultivarPhoto(
  actor: Actor,
  slug: string,
  input: { bytes: Buffer; caption: string | null; credit: string | null },
): Promise<PhotoRecord> {
  assertCan(actor, 'images:upload');
  const cultivar = await cultivarOf(slug);
  const id = await storePhoto(db, bucket, {
    ...input,
    cultivarId: Number(cultivar.id),
    cultivarSlug: cultivar.slug,
    isDemo: false,
    uploadedBy: actor.id,
  });
  return toPhoto(await db('images').where({ id }).first());
}

/** The WebP bytes of one variant of a photo; 404 when the photo or its object is missing. */
export async function getPhotoVariant(
  actor: Actor,
  id: number,
  variant: VariantName,
): Promise<Buffer> {
  assertCan(actor, 'properties:read-published');
  const row = await db('images').where({ id }).first();
  if (!row) throw new NotFoundError('No such photo.');
  const object = await getObject(variantKey(String(row.storage_prefix), variant));
  if (!object) throw new NotFoundError('The photo file is missing from storage.');
  return object.body;
}
