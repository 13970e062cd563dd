import { FemConvergenceError, FemInputError } from '@/fem';
import { AppError, RateLimitError, ValidationError, type FieldErrors } from '@/lib/errors';

/** What any typed error means to a client: one mapping for route handlers and server actions. */
export interface ErrorPayload {
  status: number;
  code: string;
  message: string;
  fieldErrors?: FieldErrors;
  headers?: Record<string, string>;
}

const SERVER_ERROR: ErrorPayload = {
  status: 500,
  code: 'server_error',
  message: 'Something went wrong on the server.',
};

/** Map an error to its status and plain message; anything untyped is logged and becomes a 500. */
export function errorPayload(error: unknown): ErrorPayload {
  if (error instanceof ValidationError) {
    return {
      status: 400,
      code: error.code,
      message: error.message,
      fieldErrors: error.fieldErrors,
    };
  }
  if (error instanceof FemInputError) {
    const fieldErrors = { [error.field]: [error.message] };
    return { status: 400, code: 'invalid_input', message: error.message, fieldErrors };
  }
  if (error instanceof FemConvergenceError) {
    return { status: 422, code: 'not_converged', message: error.message };
  }
  if (error instanceof RateLimitError) {
    const headers = { 'Retry-After': String(error.retryAfterSeconds) };
    return { status: 429, code: error.code, message: error.message, headers };
  }
  if (error instanceof AppError) {
    return { status: error.status, code: error.code, message: error.message };
  }
  console.error(error);
  return SERVER_ERROR;
}
