/** What an uploaded photo may be, and what the app makes of it. */

export const MIB = 1024 * 1024;

/** The largest photo file accepted. */
export const MAX_PHOTO_BYTES = 8 * MIB;

/** Room for the multipart envelope around the file: boundaries, part headers, caption, credit. */
export const MULTIPART_ALLOWANCE = 64 * 1024;

/** The largest upload request body. */
export const MAX_UPLOAD_BODY = MAX_PHOTO_BYTES + MULTIPART_ALLOWANCE;

/** Width × height above this is refused before a pixel is decoded (a decompression bomb). */
export const MAX_PIXELS = 40_000_000;

export const CAPTION_MAX = 300;
export const CREDIT_MAX = 200;

/** Types recognised from the bytes; anything else is refused whatever its name says. */
export const ACCEPTED_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type AcceptedType = (typeof ACCEPTED_TYPES)[number];

/** The stored WebP variants: each fits inside a square of this many pixels, never enlarged. */
export const VARIANT_SIZES = { thumb: 160, card: 480, full: 1600 } as const;
export type VariantName = keyof typeof VARIANT_SIZES;
export const VARIANT_NAMES = Object.keys(VARIANT_SIZES) as VariantName[];

export function isVariantName(value: string): value is VariantName {
  return (VARIANT_NAMES as string[]).includes(value);
}

/** The bucket key of one variant under a photo's app-made prefix. */
export function variantKey(prefix: string, variant: VariantName): string {
  return `${prefix}/${variant}.webp`;
}

/** A variant's pixel size for an image of this size: fit inside the square, never enlarged. */
export function variantSize(width: number, height: number, name: VariantName) {
  const scale = Math.min(1, VARIANT_SIZES[name] / Math.max(width, height));
  return {
    width: Math.max(1, Math.round(width * scale)),
    height: Math.max(1, Math.round(height * scale)),
  };
}
