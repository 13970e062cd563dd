import 'server-only';
import { NextResponse } from 'next/server';
import { ForbiddenError, UnsupportedMediaTypeError } from '@/lib/errors';
import { assertLengthWithin, JSON_BODY_LIMIT, readJson } from './body';
import { errorPayload } from './error-map';
import { crossSiteMessage, crossSiteReason } from './origin';

export { readJson };

/** A typed error → a JSON answer with its status; anything else → 500 without internals. */
export function errorResponse(error: unknown): NextResponse {
  const p = errorPayload(error);
  return NextResponse.json(
    { error: p.code, message: p.message, ...(p.fieldErrors && { fieldErrors: p.fieldErrors }) },
    { status: p.status, headers: p.headers },
  );
}

export interface HandleOptions {
  /** Body types a write accepts; JSON unless the route says otherwise (uploads: multipart). */
  accept?: readonly string[];
  /** The largest body accepted, refused with 413 by Content-Length before it is read. */
  maxBodyBytes?: number;
}

const WRITE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

function mediaType(request: Request): string | null {
  const value = request.headers.get('content-type');
  return value ? value.split(';')[0].trim().toLowerCase() : null;
}

function hasBody(request: Request): boolean {
  const length = request.headers.get('content-length');
  return request.body !== null && length !== '0';
}

/** The guards every state-changing request passes before the route sees it. */
function guardWrite(request: Request, options: HandleOptions): void {
  const reason = crossSiteReason(request.headers);
  if (reason) throw new ForbiddenError(crossSiteMessage(reason));
  const accept = options.accept ?? ['application/json'];
  const type = mediaType(request);
  // A declared type must be an accepted one; only a DELETE without a body may declare none.
  const bodyless = request.method === 'DELETE' && !hasBody(request);
  if (type === null ? !bodyless : !accept.includes(type)) {
    throw new UnsupportedMediaTypeError(accept);
  }
  assertLengthWithin(request, options.maxBodyBytes ?? JSON_BODY_LIMIT);
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/**
 * Wrap a route handler: writes must come from the app's own origin (403), carry an accepted body
 * type (415) and fit the size limit (413); typed errors become their status; answers are never
 * cached, since they may hold private data.
 */
export function handle<C>(fn: Handler<C>, options: HandleOptions = {}): Handler<C> {
  return async (request, context) => {
    let response: Response;
    try {
      if (WRITE_METHODS.has(request.method)) guardWrite(request, options);
      response = await fn(request, context);
    } catch (error) {
      response = errorResponse(error);
    }
    if (!response.headers.has('Cache-Control')) response.headers.set('Cache-Control', 'no-store');
    return response;
  };
}
