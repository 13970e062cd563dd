/** Typed application errors; `status` is the HTTP status a route handler answers with. */
export class AppError extends Error {
  readonly status: number;
  readonly code: string;
  constructor(status: number, code: string, message: string) {
    super(message);
    this.name = 'AppError';
    this.status = status;
    this.code = code;
  }
}

export type FieldErrors = Record<string, string[]>;

export class ValidationError extends AppError {
  readonly fieldErrors: FieldErrors;
  constructor(message: string, fieldErrors: FieldErrors = {}) {
    super(400, 'invalid_input', message);
    this.fieldErrors = fieldErrors;
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'unauthenticated', message);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'Your role may not do this.') {
    super(403, 'forbidden', message);
  }
}

export class NotFoundError extends AppError {
  constructor(message = 'Not found.') {
    super(404, 'not_found', message);
  }
}

export class ConflictError extends AppError {
  constructor(message: string) {
    super(409, 'conflict', message);
  }
}

export class GoneError extends AppError {
  constructor(message: string) {
    super(410, 'gone', message);
  }
}

export class PayloadTooLargeError extends AppError {
  constructor(limitBytes: number) {
    super(413, 'too_large', `The request body is larger than ${Math.round(limitBytes / 1024)} KB.`);
  }
}

export class UnsupportedMediaTypeError extends AppError {
  constructor(accepted: readonly string[]) {
    super(415, 'unsupported_media_type', `Send the request body as ${accepted.join(' or ')}.`);
  }
}

export class RateLimitError extends AppError {
  readonly retryAfterSeconds: number;
  constructor(message: string, retryAfterSeconds: number) {
    super(429, 'too_many_attempts', message);
    this.retryAfterSeconds = retryAfterSeconds;
  }
}

/** The client went away before the answer was ready; the work was dropped or stopped. */
export class AbortedError extends AppError {
  constructor() {
    // 499: the status proxies log for a request its client closed; the client never reads it.
    super(499, 'aborted', 'The request was abandoned before its answer was ready.');
  }
}
