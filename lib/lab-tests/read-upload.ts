import { z } from 'zod';
import { ValidationError } from '@/lib/errors';
import { readBytes } from '@/lib/http/body';
import { slugSchema } from '@/lib/validation/cultivars';
import { formObject } from '@/lib/validation/form';
import { parseInput } from '@/lib/validation/parse';
import { UPLOAD_BODY_LIMIT } from './limits';

/**
 * A multipart body read with a hard limit whatever Content-Length said (a chunked upload declares
 * none), then handed to the platform's multipart parser.
 */
export async function readUploadForm(request: Request, limit: number): Promise<FormData> {
  const body = await readBytes(request, limit);
  const type = request.headers.get('content-type') ?? '';
  try {
    return await new Response(new Uint8Array(body), {
      headers: { 'content-type': type },
    }).formData();
  } catch {
    const message = 'The upload is not a readable multipart form.';
    throw new ValidationError(message, { _form: [message] });
  }
}

/** The uploaded file part and its bytes, or a field error asking for one. */
export async function uploadedFile(form: FormData, field = 'file') {
  const file = form.get(field);
  if (!(file instanceof Blob) || (file.size === 0 && !('name' in file && file.name))) {
    const message = 'Choose a CSV file to upload.';
    throw new ValidationError(message, { [field]: [message] });
  }
  const name = 'name' in file && typeof file.name === 'string' ? file.name : 'upload.csv';
  // Control characters are dropped: the name is shown, never used as a storage key.
  const fileName = name.replace(/[\u0000-\u001f\u007f]/g, '').slice(0, 200) || 'upload.csv';
  return { fileName, bytes: new Uint8Array(await file.arrayBuffer()) };
}

/** A `[slug]` route's cultivar, a bad one refused under `cultivar` as the upload form names it. */
export async function cultivarSlugOf(params: Promise<{ slug: string }>): Promise<string> {
  return parseInput(z.object({ cultivar: slugSchema }), { cultivar: (await params).slug }).cultivar;
}

/** A lab-test upload as the data layer takes it: the file, its name and the form's text fields. */
export async function readTestUpload(request: Request, cultivarSlug: string) {
  const form = await readUploadForm(request, UPLOAD_BODY_LIMIT);
  const { fileName, bytes } = await uploadedFile(form);
  return { cultivarSlug, fileName, bytes, fields: formObject(form) };
}
