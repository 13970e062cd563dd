// Test files for the photo upload tests, all made here: nothing is copied from anywhere.
import { crc32 } from 'node:zlib';
import sharp from 'sharp';

/** A JPEG with EXIF text, GPS position and an orientation tag, as a phone camera writes. */
export async function cameraJpeg(width: number, height: number, orientation = 1) {
  return sharp({ create: { width, height, channels: 3, background: '#b8433a' } })
    .jpeg({ quality: 85 })
    .withMetadata({ orientation })
    .withExif({
      IFD0: { Artist: 'Orchard test camera', Copyright: 'Kestrel Vale test' },
      IFD3: { GPSLatitudeRef: 'S', GPSLatitude: '33/1 55/1 0/1', GPSLongitudeRef: 'E' },
    })
    .toBuffer();
}

function pngChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])) >>> 0, 0);
  return Buffer.concat([head, data, crc]);
}

/** A tiny PNG whose header claims width × height pixels (a decompression bomb's header). */
export function claimedHugePng(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, standard compression, filter, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', Buffer.from([0x78, 0x9c, 0x03, 0x00, 0x00, 0x00, 0x00, 0x01])),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A real, fully decodable one-colour PNG of many pixels that stays small on disk. */
export async function compressibleHugePng(width: number, height: number): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: '#777' } })
    .toColourspace('b-w')
    .png({ compressionLevel: 9 })
    .toBuffer();
}

/** A JPEG with a comment segment (FFFE) holding a page, placed right after the start marker. */
export function jpegWithComment(jpeg: Buffer, text: string): Buffer {
  const data = Buffer.from(text, 'latin1');
  const segment = Buffer.alloc(4);
  segment.writeUInt16BE(0xfffe, 0);
  segment.writeUInt16BE(data.length + 2, 2);
  return Buffer.concat([jpeg.subarray(0, 2), segment, data, jpeg.subarray(2)]);
}

/** The RIFF chunk names of a WebP file (VP8/VP8L/VP8X, and EXIF/XMP/ICCP if metadata were kept). */
export function webpChunks(webp: Buffer): string[] {
  const names: string[] = [];
  for (let i = 12; i + 8 <= webp.length;) {
    const size = webp.readUInt32LE(i + 4);
    names.push(webp.toString('latin1', i, i + 4));
    i += 8 + size + (size % 2);
  }
  return names;
}
