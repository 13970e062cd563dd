export type UploadErrors = Record<string, string[]>;

export interface UploadAnswer {
  id: number | null;
  message?: string;
  errors: UploadErrors;
}

/** The upload route's answer as the form shows it: the new test's id, or messages by field. */
export async function uploadAnswer(response: Response): Promise<UploadAnswer> {
  const body = await response.json().catch(() => null);
  if (response.ok && body?.test?.id) return { id: Number(body.test.id), errors: {} };
  const message: string = body?.message ?? `The upload was refused (HTTP ${response.status}).`;
  const errors: UploadErrors = { ...(body?.fieldErrors ?? {}) };
  if (response.status === 413) errors.file = ['The file is larger than 2 MB.'];
  if (response.status === 404) errors.cultivar = [message];
  const marked = Object.keys(errors).some((k) => k !== '_form');
  return {
    id: null,
    message: marked ? 'Nothing was stored: see the messages beside the fields.' : message,
    errors,
  };
}
