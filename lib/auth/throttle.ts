import 'server-only';
import { db } from '@/lib/db';

/** Sign-in throttling per e-mail: a growing delay after each failure, then a lock-out. */
export const MAX_FAILURES = 5;
export const WINDOW_MS = 15 * 60 * 1000;
export const LOCK_MS = 15 * 60 * 1000;
const DELAY_STEP_MS = 200;

export function throttleKey(email: string): string {
  return `email:${email.trim().toLowerCase()}`;
}

/** Milliseconds until the key may try again, or 0 when it is not locked. */
export async function lockedForMs(key: string, now = Date.now()): Promise<number> {
  const row = await db('sign_in_throttle').where({ key }).first();
  const until = row?.locked_until_ms == null ? 0 : Number(row.locked_until_ms);
  return until > now ? until - now : 0;
}

/** Delay to impose before answering a failed attempt (slows guessing without locking). */
export async function delayAfterFailure(key: string): Promise<number> {
  const row = await db('sign_in_throttle').where({ key }).first();
  return Math.min(Number(row?.failures ?? 0), MAX_FAILURES) * DELAY_STEP_MS;
}

export async function recordFailure(key: string, now = Date.now()): Promise<void> {
  await db.transaction(async (trx) => {
    const row = await trx('sign_in_throttle').where({ key }).first();
    const fresh = !row || now - Number(row.window_started_ms) > WINDOW_MS;
    const failures = fresh ? 1 : Number(row.failures) + 1;
    const values = {
      failures,
      window_started_ms: fresh ? now : Number(row.window_started_ms),
      locked_until_ms: failures >= MAX_FAILURES ? now + LOCK_MS : null,
    };
    if (row) await trx('sign_in_throttle').where({ key }).update(values);
    else await trx('sign_in_throttle').insert({ key, ...values });
  });
}

export async function clearFailures(key: string): Promise<void> {
  await db('sign_in_throttle').where({ key }).delete();
}
