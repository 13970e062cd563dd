import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { csrf, postCredentials } from '../support/next-auth';
import { db } from '@/lib/db';
import { beginAttempt } from '@/lib/auth/sign-in-limits';
import { clearSignInLock, getActiveActor } from '@/lib/data/users';
import { NextRequest } from 'next/server';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';

// The limits written out (not read from the module): 5 per account and address in 15 minutes,
// 100 per account over all addresses in an hour.
const PER_ADDRESS = 5;
const ACCOUNT_CEILING = 100;

const auditCount = async (action: string, email: string) =>
  Number(
    (
      await db('audit_log')
        .where({ action })
        .andWhere('detail', 'like', `%"email":"${email}"%`)
        .count({ n: '*' })
    )[0].n,
  );

const signedIn = async (response: Response) => {
  if (response.status !== 200) return false;
  const { url } = (await response.json()) as { url: string };
  return !new URL(url).searchParams.has('error');
};

describe('credentials sign-in through the real next-auth route', () => {
  let session: { token: string; cookie: string };
  beforeAll(async () => {
    await freshDatabase();
  });
  beforeEach(async () => {
    await db('sign_in_limits').delete();
    session = await csrf();
  });

  it('signs in a seeded user and audits the success without the password', async () => {
    const res = await postCredentials(ACCOUNTS.editor, DEMO_PASSWORD, session);
    expect(await signedIn(res)).toBe(true);
    expect(res.headers.getSetCookie().some((c) => c.startsWith('next-auth.session-token='))).toBe(
      true,
    );
    const row = await db('audit_log').where({ action: 'sign-in.success' }).first();
    expect(row.actor_id).toBe(await userId(ACCOUNTS.editor));
    expect(row.detail).not.toContain(DEMO_PASSWORD);
  });

  it('refuses a disabled account and audits why', async () => {
    await db('users').where({ email: ACCOUNTS.buyer }).update({ disabled: true });
    expect(await signedIn(await postCredentials(ACCOUNTS.buyer, DEMO_PASSWORD, session))).toBe(
      false,
    );
    const row = await db('audit_log')
      .where({ action: 'sign-in.failure' })
      .orderBy('id', 'desc')
      .first();
    expect(JSON.parse(row.detail).reason).toBe('disabled');
    await db('users').where({ email: ACCOUNTS.buyer }).update({ disabled: false });
  });

  it('20 wrong passwords in parallel: at most 5 are evaluated, the rest get 429', async () => {
    const email = ACCOUNTS.engineer;
    const before = await auditCount('sign-in.failure', email);
    const burst = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        postCredentials(email, `guess-${i}`, session, '10.9.9.9'),
      ),
    );
    const statuses = burst.map((r) => r.status);
    expect(statuses.filter((s) => s === 429)).toHaveLength(20 - PER_ADDRESS);
    expect((await auditCount('sign-in.failure', email)) - before).toBe(PER_ADDRESS);
    expect(await auditCount('sign-in.locked', email)).toBe(1);
    const refused = burst.find((r) => r.status === 429)!;
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await refused.json()).message).toMatch(/Too many sign-in attempts/);

    // The right password from the locked address is refused too, and not evaluated.
    const right = await postCredentials(email, DEMO_PASSWORD, session, '10.9.9.9');
    expect(right.status).toBe(429);
    expect((await auditCount('sign-in.failure', email)) - before).toBe(PER_ADDRESS);

    // The owner, from another address, is not locked out by the guesser.
    expect(await signedIn(await postCredentials(email, DEMO_PASSWORD, session, '127.0.0.1'))).toBe(
      true,
    );
  });

  it('a right password inside a parallel burst does not sign in once the limit is spent', async () => {
    const email = ACCOUNTS.admin;
    const wrong = Array.from({ length: PER_ADDRESS }, (_, i) =>
      postCredentials(email, `guess-${i}`, session, '10.1.1.1'),
    );
    await Promise.all(wrong);
    const burst = await Promise.all([
      postCredentials(email, 'guess-x', session, '10.1.1.1'),
      postCredentials(email, DEMO_PASSWORD, session, '10.1.1.1'),
    ]);
    expect(burst.map((r) => r.status)).toEqual([429, 429]);
  });

  it('an admin clears the lock, which is audited', async () => {
    const email = ACCOUNTS.buyer;
    await Promise.all(
      Array.from({ length: PER_ADDRESS + 1 }, () =>
        postCredentials(email, 'nope', session, '10.2.2.2'),
      ),
    );
    expect((await postCredentials(email, DEMO_PASSWORD, session, '10.2.2.2')).status).toBe(429);
    const admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    expect(await clearSignInLock(admin, await userId(email))).toBeGreaterThan(0);
    expect(await auditCount('sign-in.unlock', email)).toBe(1);
    expect(await signedIn(await postCredentials(email, DEMO_PASSWORD, session, '10.2.2.2'))).toBe(
      true,
    );
  });

  it(`the account-wide ceiling (${ACCOUNT_CEILING}) holds across many addresses`, async () => {
    const email = 'spread.attack@kestrelvale.example';
    for (let i = 0; i < ACCOUNT_CEILING; i++) {
      expect((await beginAttempt(email, `10.3.${i >> 8}.${i & 255}`)).allowed).toBe(true);
    }
    const next = await beginAttempt(email, '10.4.0.1');
    expect(next).toMatchObject({ allowed: false, limit: 'account', lockStarted: true });
  });
});

describe('odd requests to the sign-in routes get a 4xx, not a 500', () => {
  const ctx = { params: Promise.resolve({ nextauth: ['callback', 'credentials'] }) };
  const url = 'http://tenderline.test/api/auth/callback/credentials';
  const tables = ['users', 'audit_log', 'sign_in_limits'];
  const snapshot = async () => Promise.all(tables.map((t) => countRows(t)));

  it('GET of the credentials callback → 405', async () => {
    const res = await nextauth.GET(new NextRequest(url), ctx);
    expect(res.status).toBe(405);
    expect(res.headers.get('allow')).toBe('POST');
  });

  it('a malformed JSON body → 415, nothing counted', async () => {
    const before = await snapshot();
    const res = await nextauth.POST(
      new NextRequest(url, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: '{"email":',
      }),
      ctx,
    );
    expect(res.status).toBe(415);
    expect(await snapshot()).toEqual(before);
  });

  it('a foreign Origin → 403', async () => {
    const res = await nextauth.POST(
      new NextRequest(url, {
        method: 'POST',
        headers: {
          'content-type': 'application/x-www-form-urlencoded',
          origin: 'http://127.0.0.1:4999',
        },
        body: 'email=a%40b.example&password=x',
      }),
      ctx,
    );
    expect(res.status).toBe(403);
  });

  it('an oversized form body → 413', async () => {
    const res = await nextauth.POST(
      new NextRequest(url, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: `email=a%40b.example&password=${'x'.repeat(20_000)}`,
      }),
      ctx,
    );
    expect(res.status).toBe(413);
  });
});
