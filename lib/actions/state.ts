import { AppError, ValidationError, type FieldErrors } from '@/lib/errors';

/** What a server action answers; `status` mirrors the HTTP status a route handler would give. */
export interface ActionState {
  status: number;
  ok: boolean;
  message?: string;
  fieldErrors?: FieldErrors;
}

export const initialActionState: ActionState = { status: 0, ok: false };

/** Run an action body; typed errors become a state with their status and messages. */
export async function runAction(body: () => Promise<string>): Promise<ActionState> {
  try {
    return { status: 200, ok: true, message: await body() };
  } catch (error) {
    if (error instanceof ValidationError) {
      return { status: 400, ok: false, message: error.message, fieldErrors: error.fieldErrors };
    }
    if (error instanceof AppError)
      return { status: error.status, ok: false, message: error.message };
    console.error(error);
    return { status: 500, ok: false, message: 'Something went wrong on the server.' };
  }
}

/** FormData → a plain object of its string fields. */
export function formObject(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of form.entries()) if (typeof value === 'string') out[key] = value;
  return out;
}
