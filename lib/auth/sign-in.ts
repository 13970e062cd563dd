import 'server-only';
import { db } from '@/lib/db';
import { recordAudit } from '@/lib/audit-trail';
import type { Actor } from './actor';
import { findCredentials } from './accounts';
import { beginAttempt, normaliseEmail, refundAttempt } from './sign-in-limits';

export type SignInOutcome =
  | { kind: 'signed-in'; user: Actor }
  | { kind: 'failed' }
  | { kind: 'limited'; retryAfterMs: number };

async function audit(action: string, actorId: number | null, detail: Record<string, unknown>) {
  await db.transaction((trx) =>
    recordAudit(trx, { actorId, action, entity: 'sign-in', entityId: actorId, detail }),
  );
}

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * One credentials sign-in: the attempt is counted first (refused with a wait when a limit is
 * spent, without looking at the password), then the password is checked. Successes, failures and
 * the start of each lock-out go to the audit log with the address, never the password.
 */
export async function attemptSignIn(
  rawEmail: string,
  password: string,
  address: string,
): Promise<SignInOutcome> {
  const email = normaliseEmail(rawEmail);
  const ticket = await beginAttempt(email, address);
  if (!ticket.allowed) {
    if (ticket.lockStarted) {
      await audit('sign-in.locked', null, { email, address, limit: ticket.limit });
    }
    return { kind: 'limited', retryAfterMs: ticket.retryAfterMs };
  }
  const result = await findCredentials(email, password);
  if (result.user) {
    await refundAttempt(ticket.keys);
    await audit('sign-in.success', result.user.id, { email, address });
    return { kind: 'signed-in', user: result.user };
  }
  await audit('sign-in.failure', result.knownId, { email, address, reason: result.reason });
  await pause(ticket.delayMs);
  return { kind: 'failed' };
}
