import 'server-only';
import {
  RateLimiterPostgres,
  RateLimiterRes,
  RateLimiterSQLite,
  type RateLimiterAbstract,
} from 'rate-limiter-flexible';
import type { Knex } from 'knex';
import { db } from '@/lib/db';

/**
 * Sign-in limits, counted in the database (one atomic upsert per attempt, shared by every request
 * and process) BEFORE the password is checked, so a burst of parallel guesses cannot outrun them:
 * - per account and client address: 5 attempts in 15 minutes, then 15 minutes' block;
 * - per client address, over all accounts: 30 in 15 minutes;
 * - per account, over all addresses: a much higher ceiling of 100 an hour, so nobody elsewhere
 *   can lock the owner out with a handful of guesses, plus a delay that grows with it.
 * A successful sign-in refunds its own attempt; it does not wipe anyone's failures.
 */
export const LIMITS = {
  pair: { keyPrefix: 'signin-pair', points: 5, duration: 15 * 60, blockDuration: 15 * 60 },
  address: { keyPrefix: 'signin-addr', points: 30, duration: 15 * 60, blockDuration: 15 * 60 },
  account: { keyPrefix: 'signin-acct', points: 100, duration: 3600, blockDuration: 3600 },
} as const;
type LimitName = keyof typeof LIMITS;

const TABLE = 'sign_in_limits';
const DELAY_STEP_MS = 150;
const DELAY_MAX_MS = 3000;

function makeLimiter(name: LimitName): RateLimiterAbstract {
  const client = String(db.client.config.client);
  const options = { ...LIMITS[name], storeClient: db, storeType: 'knex', tableName: TABLE };
  const opts = { ...options, tableCreated: true };
  return client === 'pg' ? new RateLimiterPostgres(opts) : new RateLimiterSQLite(opts);
}

const globalForLimits = globalThis as unknown as {
  tenderlineLimits?: Record<LimitName, RateLimiterAbstract>;
};
function limiters(): Record<LimitName, RateLimiterAbstract> {
  globalForLimits.tenderlineLimits ??= {
    pair: makeLimiter('pair'),
    address: makeLimiter('address'),
    account: makeLimiter('account'),
  };
  return globalForLimits.tenderlineLimits;
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

function keysFor(email: string, address: string): Record<LimitName, string> {
  const account = normaliseEmail(email);
  return { pair: `${account}|${address}`, address, account };
}

export type AttemptTicket =
  | { allowed: true; keys: Record<LimitName, string>; delayMs: number }
  | { allowed: false; limit: LimitName; retryAfterMs: number; lockStarted: boolean };

/** Count one attempt against every limit; refused as soon as one is exhausted. */
export async function beginAttempt(email: string, address: string): Promise<AttemptTicket> {
  const keys = keysFor(email, address);
  let accountUsed = 0;
  for (const name of ['pair', 'address', 'account'] as const) {
    try {
      const res = await limiters()[name].consume(keys[name]);
      if (name === 'account') accountUsed = res.consumedPoints;
    } catch (rejection) {
      if (!(rejection instanceof RateLimiterRes)) throw rejection;
      const lockStarted = rejection.consumedPoints === LIMITS[name].points + 1;
      return { allowed: false, limit: name, retryAfterMs: rejection.msBeforeNext, lockStarted };
    }
  }
  const delayMs = Math.min(DELAY_MAX_MS, DELAY_STEP_MS * Math.max(0, accountUsed - 3));
  return { allowed: true, keys, delayMs };
}

/** A successful sign-in gives back the attempt it used. */
export async function refundAttempt(keys: Record<LimitName, string>): Promise<void> {
  for (const name of ['pair', 'address', 'account'] as const) {
    await limiters()[name].reward(keys[name], 1);
  }
}

export interface AccountLock {
  email: string;
  /** Which limit holds it: one address, or the account-wide ceiling. */
  scope: 'address' | 'account';
  address?: string;
  untilMs: number;
}

/** Accounts that are locked now (admins see and clear them on the users page). */
export async function listAccountLocks(now = Date.now()): Promise<AccountLock[]> {
  const rows = await db(TABLE).where('expire', '>', now).select('key', 'points', 'expire');
  const locks: AccountLock[] = [];
  for (const row of rows) {
    const key = String(row.key);
    const untilMs = Number(row.expire);
    if (key.startsWith(`${LIMITS.pair.keyPrefix}:`) && row.points > LIMITS.pair.points) {
      const rest = key.slice(LIMITS.pair.keyPrefix.length + 1);
      const cut = rest.lastIndexOf('|');
      locks.push({
        email: rest.slice(0, cut),
        scope: 'address',
        address: rest.slice(cut + 1),
        untilMs,
      });
    } else if (
      key.startsWith(`${LIMITS.account.keyPrefix}:`) &&
      row.points > LIMITS.account.points
    ) {
      locks.push({
        email: key.slice(LIMITS.account.keyPrefix.length + 1),
        scope: 'account',
        untilMs,
      });
    }
  }
  return locks.sort((a, b) => a.email.localeCompare(b.email));
}

/** Delete every per-address and account-wide count of one account; returns how many went. */
export async function clearAccountLimits(trx: Knex.Transaction, email: string): Promise<number> {
  const account = normaliseEmail(email);
  const rows = await trx(TABLE).select('key');
  const pairPrefix = `${LIMITS.pair.keyPrefix}:${account}|`;
  const accountKey = `${LIMITS.account.keyPrefix}:${account}`;
  const doomed = rows
    .map((r) => String(r.key))
    .filter((k) => k === accountKey || k.startsWith(pairPrefix));
  if (doomed.length) await trx(TABLE).whereIn('key', doomed).delete();
  return doomed.length;
}
