import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { fileError, PhotoTooLargeError, PhotoTypeError } from './errors';
import { embeddedMarkup, imageEnd } from './image-end';
import { ACCEPTED_TYPES, MAX_PHOTO_BYTES, MAX_PIXELS, type AcceptedType } from './limits';

export interface InspectedImage {
  type: AcceptedType;
  /** Pixel size as the image is meant to be seen (after its EXIF orientation). */
  width: number;
  height: number;
}

const SHARP_FORMAT: Record<AcceptedType, string> = {
  'image/jpeg': 'jpeg',
  'image/png': 'png',
  'image/webp': 'webp',
};

const isAccepted = (mime: string): mime is AcceptedType =>
  (ACCEPTED_TYPES as readonly string[]).includes(mime);

/** The type the bytes prove, never the name's or the declared one. */
async function sniff(bytes: Buffer): Promise<AcceptedType> {
  const found = await fileTypeFromBuffer(bytes);
  if (!found) {
    throw new PhotoTypeError(
      'The file is not a JPEG, PNG or WebP image: its contents are not an image.',
    );
  }
  if (!isAccepted(found.mime)) {
    throw new PhotoTypeError(
      `The file's contents are ${found.mime}, not a JPEG, PNG or WebP image.`,
    );
  }
  return found.mime;
}

/** Refuse anything but a clean image: bytes after its end, or page/script markup inside it. */
function assertClean(bytes: Buffer, type: AcceptedType): void {
  const label = SHARP_FORMAT[type].toUpperCase();
  const end = imageEnd(bytes, type);
  if (end === null) throw fileError(`The ${label} image is damaged or cut short.`);
  const trailing = bytes.subarray(end);
  if (trailing.some((byte) => byte !== 0)) {
    throw fileError(
      `The file carries ${trailing.length} bytes after the end of the ${label} image; ` +
        'save or export it again as a plain image.',
    );
  }
  const markup = embeddedMarkup(bytes);
  if (markup) {
    throw fileError(`The file holds web-page or script markup (${markup}…) besides the image.`);
  }
}

/** Header-only read of the pixel size: a decompression bomb is refused before it is decoded. */
async function pixelSize(bytes: Buffer, type: AcceptedType) {
  // The header read itself needs no pixel limit (sharp's default one would hide the size).
  const meta = await sharp(bytes, { limitInputPixels: false })
    .metadata()
    .catch(() => null);
  if (!meta || meta.format !== SHARP_FORMAT[type] || !meta.width || !meta.height) {
    throw fileError('The image could not be read: it may be damaged.');
  }
  if (meta.width * meta.height > MAX_PIXELS) {
    const mp = ((meta.width * meta.height) / 1e6).toLocaleString('en-GB', {
      maximumFractionDigits: 1,
    });
    throw fileError(
      `The image is ${meta.width} × ${meta.height} px (${mp} megapixels); ` +
        `the limit is ${MAX_PIXELS / 1e6} megapixels.`,
    );
  }
  return meta.autoOrient ?? { width: meta.width, height: meta.height };
}

/** Everything that can be checked before decoding: size, type from the bytes, cleanliness, pixels. */
export async function inspectImage(bytes: Buffer): Promise<InspectedImage> {
  if (bytes.length === 0) throw fileError('Choose a photo to upload: the file is empty.');
  if (bytes.length > MAX_PHOTO_BYTES) throw new PhotoTooLargeError();
  const type = await sniff(bytes);
  assertClean(bytes, type);
  const { width, height } = await pixelSize(bytes, type);
  return { type, width, height };
}
