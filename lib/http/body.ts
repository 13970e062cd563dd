import { PayloadTooLargeError, ValidationError } from '@/lib/errors';

/** JSON bodies of the app's forms are small; uploads name their own limit. */
export const JSON_BODY_LIMIT = 256 * 1024;

/** Refuse by the declared Content-Length, before a byte is read. */
export function assertLengthWithin(request: Request, limit: number): void {
  const declared = Number(request.headers.get('content-length') ?? 0);
  if (Number.isFinite(declared) && declared > limit) throw new PayloadTooLargeError(limit);
}

/** Read the body's bytes, stopping (413) as soon as they pass the limit, whatever it declared. */
export async function readBytes(request: Request, limit: number): Promise<Buffer> {
  assertLengthWithin(request, limit);
  if (!request.body) return Buffer.alloc(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw new PayloadTooLargeError(limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** Read the body as UTF-8 text within the limit (see readBytes). */
export async function readText(request: Request, limit = JSON_BODY_LIMIT): Promise<string> {
  return (await readBytes(request, limit)).toString('utf8');
}

/** Read a JSON body; malformed JSON is a 400, an oversized one a 413. The caller validates the shape. */
export async function readJson(request: Request, limit = JSON_BODY_LIMIT): Promise<unknown> {
  const text = await readText(request, limit);
  try {
    return JSON.parse(text);
  } catch {
    const message = 'The request body must be valid JSON.';
    throw new ValidationError(message, { _form: [message] });
  }
}
