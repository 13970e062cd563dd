import { readBytes } from '@/lib/http/body';
import { formObject } from '@/lib/validation/form';
import { fileError, PhotoTooLargeError } from './errors';
import { fileNameProblem } from './fields';
import { MAX_PHOTO_BYTES, MAX_UPLOAD_BODY } from './limits';

export interface Upload {
  bytes: Buffer;
  /** The text fields (caption, credit, anything else sent), for the caller's schema. */
  fields: Record<string, string>;
}

async function parseForm(body: Buffer, contentType: string): Promise<FormData> {
  try {
    return await new Response(new Uint8Array(body), {
      headers: { 'content-type': contentType },
    }).formData();
  } catch {
    throw fileError('The upload could not be read as multipart form data.');
  }
}

/** One photo file and its text fields from a multipart request, within the size limits. */
export async function readUpload(request: Request): Promise<Upload> {
  const body = await readBytes(request, MAX_UPLOAD_BODY);
  const form = await parseForm(body, request.headers.get('content-type') ?? '');
  const files = form.getAll('file');
  if (files.length > 1) throw fileError('Send one photo at a time.');
  const file = files[0];
  if (typeof file !== 'object' || file.size === 0) throw fileError('Choose a photo to upload.');
  if (file.size > MAX_PHOTO_BYTES) throw new PhotoTooLargeError();
  const nameProblem = fileNameProblem(file.name);
  if (nameProblem) throw fileError(nameProblem);
  return { bytes: Buffer.from(await file.arrayBuffer()), fields: formObject(form) };
}
