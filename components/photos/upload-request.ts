import { MAX_PHOTO_BYTES, MIB } from '@/lib/photos/limits';

export interface UploadResult {
  ok: boolean;
  message?: string;
  fieldErrors?: Record<string, string[]>;
}

/** What is wrong with the chosen file before it is sent, or null (the server checks again). */
export function chosenFileProblem(file: FormDataEntryValue | null): string | null {
  if (!(file instanceof File) || file.size === 0) return 'Choose a photo to upload.';
  if (file.size > MAX_PHOTO_BYTES) return `The photo is larger than ${MAX_PHOTO_BYTES / MIB} MB.`;
  return null;
}

/** An answer of the upload route → field or form messages. Size and type refusals name the file. */
export function uploadResult(status: number, text: string): UploadResult {
  if (status === 201) return { ok: true, message: 'Photo added.' };
  let body: { message?: string; fieldErrors?: Record<string, string[]> } = {};
  try {
    body = JSON.parse(text);
  } catch {
    return { ok: false, message: `The upload failed (HTTP ${status}). Try again.` };
  }
  const message = body.message ?? `The upload failed (HTTP ${status}).`;
  if (body.fieldErrors && Object.keys(body.fieldErrors).length) {
    return { ok: false, message, fieldErrors: body.fieldErrors };
  }
  if (status === 413 || status === 415) return { ok: false, fieldErrors: { file: [message] } };
  return { ok: false, message };
}

/** POST the form with upload progress (fetch cannot report it), resolving with the answer. */
export function sendPhoto(
  url: string,
  form: FormData,
  onProgress: (percent: number) => void,
): Promise<UploadResult> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(Math.round((event.loaded / event.total) * 100));
    };
    xhr.onload = () => resolve(uploadResult(xhr.status, xhr.responseText));
    xhr.onerror = () =>
      resolve({ ok: false, message: 'The upload did not reach the server. Try again.' });
    xhr.send(form);
  });
}
