import 'server-only';
import { NextResponse } from 'next/server';
import { AppError, RateLimitError, ValidationError } from '@/lib/errors';
import { FemInputError } from '@/fem/errors';

/** A typed error → a JSON answer with its status; anything else → 500 without internals. */
export function errorResponse(error: unknown): NextResponse {
  if (error instanceof ValidationError) {
    return NextResponse.json(
      { error: error.code, message: error.message, fieldErrors: error.fieldErrors },
      { status: 400 },
    );
  }
  if (error instanceof FemInputError) {
    return NextResponse.json(
      {
        error: 'invalid_input',
        message: error.message,
        fieldErrors: { [error.field]: [error.message] },
      },
      { status: 400 },
    );
  }
  if (error instanceof RateLimitError) {
    return NextResponse.json(
      { error: error.code, message: error.message },
      { status: 429, headers: { 'Retry-After': String(error.retryAfterSeconds) } },
    );
  }
  if (error instanceof AppError) {
    return NextResponse.json(
      { error: error.code, message: error.message },
      { status: error.status },
    );
  }
  console.error(error);
  return NextResponse.json(
    { error: 'server_error', message: 'Something went wrong on the server.' },
    { status: 500 },
  );
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wrap a route handler so typed errors become their HTTP status. */
export function handle<C>(fn: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await fn(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

const MAX_BODY_BYTES = 256 * 1024;

/** Read a JSON body; malformed or oversized JSON is a 400. The data layer validates the shape. */
export async function readJson(request: Request): Promise<unknown> {
  const text = await request.text();
  if (text.length > MAX_BODY_BYTES) throw new ValidationError('The request body is too large.');
  try {
    return JSON.parse(text);
  } catch {
    throw new ValidationError('The request body must be valid JSON.', {
      _form: ['The request body must be valid JSON.'],
    });
  }
}

/** Parse a positive integer id from a route segment, or 400. */
export function parseId(value: string, field = 'id'): number {
  const id = Number(value);
  if (!Number.isInteger(id) || id <= 0)
    throw new ValidationError(`The ${field} must be a positive whole number.`, {
      [field]: ['Must be a positive whole number.'],
    });
  return id;
}
