import type { PhotoRecord } from '@/lib/photos/record';
import { VARIANT_NAMES, type VariantName } from './limits';

/** Where a photo's variant is served from. */
export function photoUrl(id: number, variant: VariantName): string {
  return `/api/photos/${id}/${variant}`;
}

/** A photo in the JSON API: sizes name their unit. */
export function photoJson(photo: PhotoRecord) {
  return {
    id: photo.id,
    caption: photo.caption,
    credit: photo.credit,
    demo: photo.isDemo,
    widthPx: photo.width,
    heightPx: photo.height,
    sizeBytes: photo.bytes,
    originalType: photo.originalType,
    createdAt: photo.createdAt,
    urls: Object.fromEntries(VARIANT_NAMES.map((v) => [v, photoUrl(photo.id, v)])) as Record<
      VariantName,
      string
    >,
  };
}
