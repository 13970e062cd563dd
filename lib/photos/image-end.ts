/**
 * Where an image's own data ends, read from its container structure, so bytes carried after it
 * (a JPEG with an HTML page appended, a "polyglot") can be refused. Pure byte arithmetic.
 */
import type { AcceptedType } from './limits';

const isRestart = (m: number) => m >= 0xd0 && m <= 0xd7;

/** Walk the JPEG segments, skipping entropy-coded scans, to the end-of-image marker. */
function jpegEnd(b: Buffer): number | null {
  if (b[0] !== 0xff || b[1] !== 0xd8) return null;
  let i = 2;
  while (i + 1 < b.length) {
    if (b[i] !== 0xff) return null;
    const marker = b[i + 1];
    if (marker === 0xff) i += 1;
    else if (marker === 0xd9) return i + 2;
    else if (isRestart(marker) || marker === 0x01) i += 2;
    else {
      if (i + 3 >= b.length) return null;
      i += 2 + b.readUInt16BE(i + 2);
      if (marker !== 0xda) continue;
      // Scan data: a 0xFF is either a stuffed 0xFF00, a restart marker, or the next marker.
      while (i + 1 < b.length && !(b[i] === 0xff && b[i + 1] !== 0 && !isRestart(b[i + 1]))) i++;
    }
  }
  return null;
}

/** Walk the PNG chunks to the end of IEND. */
function pngEnd(b: Buffer): number | null {
  let i = 8;
  while (i + 12 <= b.length) {
    const length = b.readUInt32BE(i);
    const type = b.toString('latin1', i + 4, i + 8);
    i += 12 + length;
    if (type === 'IEND') return i <= b.length ? i : null;
  }
  return null;
}

/** A WebP file is one RIFF chunk whose header says its size (padded to an even length). */
function webpEnd(b: Buffer): number | null {
  if (b.length < 12 || b.toString('latin1', 0, 4) !== 'RIFF') return null;
  const size = b.readUInt32LE(4);
  const end = 8 + size + (size % 2);
  return end <= b.length ? end : null;
}

const END = { 'image/jpeg': jpegEnd, 'image/png': pngEnd, 'image/webp': webpEnd };

/** Byte offset just past the image data, or null when the structure is broken or cut short. */
export function imageEnd(bytes: Buffer, type: AcceptedType): number | null {
  return END[type](bytes);
}

/** Markup a browser or interpreter would run if these bytes were ever read as a page or script. */
const MARKUP = ['<script', '<html', '<!doctype', '<body', '<iframe', '<svg', '<?php', '<%@'];

/** The first markup fragment found anywhere in the bytes (case-insensitive), or null. */
export function embeddedMarkup(bytes: Buffer): string | null {
  const text = bytes.toString('latin1').toLowerCase();
  return MARKUP.find((m) => text.includes(m)) ?? null;
}
