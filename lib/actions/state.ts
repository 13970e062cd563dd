import 'server-only';
import { headers } from 'next/headers';
import { unstable_rethrow } from 'next/navigation';
import { ForbiddenError, type FieldErrors } from '@/lib/errors';
import { errorPayload } from '@/lib/http/error-map';
import { crossSiteMessage, crossSiteReason } from '@/lib/http/origin';

/** What a server action answers; `status` mirrors the HTTP status a route handler would give. */
export interface ActionState {
  status: number;
  ok: boolean;
  message?: string;
  fieldErrors?: FieldErrors;
  /** Values to put back into the form after an error (never passwords). */
  values?: Record<string, string>;
}

/**
 * Run an action body after the same cross-site check as route handlers (proxy.ts refuses a
 * foreign origin first with a plain 403; this is the second layer). Typed errors become a state
 * with their status and messages, through the one error map.
 */
export async function runAction(body: () => Promise<string>): Promise<ActionState> {
  try {
    const reason = crossSiteReason(await headers());
    if (reason) throw new ForbiddenError(crossSiteMessage(reason));
    return { status: 200, ok: true, message: await body() };
  } catch (error) {
    unstable_rethrow(error); // redirect() and notFound() are Next's control flow, not errors
    const p = errorPayload(error);
    return { status: p.status, ok: false, message: p.message, fieldErrors: p.fieldErrors };
  }
}
