import { ValidationError } from '@/lib/errors';
import { MAX_FILE_BYTES, groupDigits } from './limits';

/** A refusal of the uploaded file: the message goes beside the file field and in the answer. */
export function fileError(message: string): ValidationError {
  return new ValidationError(message, { file: [message] });
}

const rowAt = (text: string, index: number) => text.slice(0, index).split(/\r\n|\n|\r/).length;

/**
 * The file's bytes as text, refusing anything but UTF-8 (a UTF-8 byte-order mark, as spreadsheet
 * programs write, is dropped). Other encodings would turn numbers into mojibake or NUL-padded
 * digits; refusing names the problem instead of mis-reading the data.
 */
export function decodeCsvBytes(bytes: Uint8Array): string {
  if (bytes.length === 0) throw fileError('the file is empty');
  if (bytes.length > MAX_FILE_BYTES) {
    throw fileError(
      `the file is larger than 2 MB (${groupDigits(bytes.length)} bytes; at most ${groupDigits(MAX_FILE_BYTES)})`,
    );
  }
  const [b0, b1] = bytes;
  if ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff)) {
    throw fileError(
      'the file is not UTF-8 text: it starts with a UTF-16 byte-order mark; save it as "CSV UTF-8"',
    );
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    const lossy = new TextDecoder('utf-8').decode(bytes);
    const row = rowAt(lossy, Math.max(0, lossy.indexOf('\uFFFD')));
    throw fileError(`row ${row}: the file is not UTF-8 text (bytes that are not valid UTF-8)`);
  }
  const nul = text.indexOf('\u0000');
  if (nul >= 0) {
    throw fileError(
      `row ${rowAt(text, nul)}: the file is not UTF-8 text (it holds NUL bytes, as UTF-16 does); save it as "CSV UTF-8"`,
    );
  }
  if (text.trim() === '') throw fileError('the file is empty');
  return text;
}
