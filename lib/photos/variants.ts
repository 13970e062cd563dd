import sharp from 'sharp';
import { fileError } from './errors';
import { MAX_PIXELS, VARIANT_NAMES, VARIANT_SIZES, type VariantName } from './limits';

export interface Variant {
  name: VariantName;
  data: Buffer;
  width: number;
  height: number;
}

/**
 * The stored WebP variants. sharp writes no metadata unless asked (no withMetadata here), so EXIF,
 * GPS, XMP and ICC are dropped; the orientation is applied to the pixels first. The pixel limit
 * is passed to the decoder as well, in case a header understated the size.
 */
async function makeVariant(bytes: Buffer, name: VariantName): Promise<Variant> {
  const size = VARIANT_SIZES[name];
  const { data, info } = await sharp(bytes, {
    limitInputPixels: MAX_PIXELS,
    autoOrient: true,
    failOn: 'warning',
  })
    .resize({ width: size, height: size, fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 82 })
    .toBuffer({ resolveWithObject: true });
  return { name, data, width: info.width, height: info.height };
}

export async function makeVariants(bytes: Buffer): Promise<Variant[]> {
  try {
    return await Promise.all(VARIANT_NAMES.map((name) => makeVariant(bytes, name)));
  } catch {
    throw fileError('The image could not be decoded: it may be damaged or cut short.');
  }
}
