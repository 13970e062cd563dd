import { randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { recordAudit } from '@/lib/audit-trail';
import { inspectImage } from './inspect';
import { VARIANT_NAMES, variantKey } from './limits';
import { makeVariants } from './variants';

/** The bucket, as the pipeline needs it (the app's object store, or the seed's own client). */
export interface PhotoBucket {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  remove(key: string): Promise<void>;
}

export interface NewPhoto {
  cultivarId: number;
  cultivarSlug: string;
  bytes: Buffer;
  caption: string | null;
  credit: string | null;
  isDemo: boolean;
  uploadedBy: number;
}

/**
 * Check, convert and store one photo: the variants go to the bucket under a random app-made
 * prefix, then the images row and its audit row in one transaction. If anything after the first
 * object fails, the objects are removed again, so a refused or failed upload leaves nothing.
 */
export async function storePhoto(knex: Knex, bucket: PhotoBucket, photo: NewPhoto) {
  const image = await inspectImage(photo.bytes);
  const variants = await makeVariants(photo.bytes);
  const prefix = `photos/${photo.cultivarId}/${randomBytes(16).toString('hex')}`;
  try {
    for (const v of variants) await bucket.put(variantKey(prefix, v.name), v.data, 'image/webp');
    return await knex.transaction(async (trx) => {
      const [row] = await trx('images')
        .insert({
          cultivar_id: photo.cultivarId,
          storage_prefix: prefix,
          original_type: image.type,
          width: image.width,
          height: image.height,
          bytes: photo.bytes.length,
          caption: photo.caption,
          credit: photo.credit,
          is_demo: photo.isDemo,
          uploaded_by: photo.uploadedBy,
          created_at: new Date(),
        })
        .returning('id');
      const id = typeof row === 'object' ? Number(row.id) : Number(row);
      await recordAudit(trx, {
        actorId: photo.uploadedBy,
        action: 'image.upload',
        entity: 'image',
        entityId: id,
        detail: { cultivar: photo.cultivarSlug, type: image.type, demo: photo.isDemo },
      });
      return id;
    });
  } catch (error) {
    await Promise.allSettled(VARIANT_NAMES.map((name) => bucket.remove(variantKey(prefix, name))));
    throw error;
  }
}
