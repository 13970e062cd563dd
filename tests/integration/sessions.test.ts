import { vi, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { requestState, setRequestHeaders } from '../support/request';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { cookiesOf, csrf, getNextAuth, postCredentials } from '../support/next-auth';
import { decodeSessionToken } from '@/lib/auth/session-token';
import { db } from '@/lib/db';
import { getActiveActor, updateUser } from '@/lib/data/users';
import * as me from '@/app/api/me/route';
import * as password from '@/app/api/account/password/route';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';
import { signOutEverywhereAction } from '@/lib/actions/account';

// No session mock here: the real next-auth JWT cookie goes through the real callbacks.
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

const ORIGIN = 'http://tenderline.test';

/** Sign in for real and return the cookie header a browser would send afterwards. */
async function signIn(email: string, pass = DEMO_PASSWORD): Promise<string> {
  const session = await csrf();
  const response = await postCredentials(email, pass, session);
  expect(response.status).toBe(200);
  return `${session.cookie}; ${cookiesOf(response)}`;
}

async function meStatus(cookie: string): Promise<number> {
  setRequestHeaders({ cookie });
  return (await me.GET(new Request(`${ORIGIN}/api/me`, { headers: { cookie } }), {})).status;
}

async function sessionBody(cookie: string): Promise<Record<string, unknown>> {
  return (await (await getNextAuth('session', cookie)).json()) as Record<string, unknown>;
}

describe('sessions end when they should', () => {
  beforeAll(async () => {
    await freshDatabase();
  });
  beforeEach(async () => {
    await db('sign_in_limits').delete();
  });

  it('a live cookie opens /api/me and /api/auth/session', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    expect(await meStatus(cookie)).toBe(200);
    expect(await sessionBody(cookie)).toHaveProperty('user.role', 'engineer');
  });

  it('after sign-out the old cookie is refused (401) and the session route agrees', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const other = await signIn(ACCOUNTS.engineer);
    // The CSRF token that belongs to the csrf cookie inside `cookie` (sign-in set both).
    const token = decodeURIComponent(
      cookie
        .split('; ')
        .find((c) => c.startsWith('next-auth.csrf-token='))!
        .split('=')[1],
    ).split('|')[0];
    setRequestHeaders({ cookie, 'content-type': 'application/x-www-form-urlencoded' });
    const signOut = await nextauth.POST(
      new NextRequest(`${ORIGIN}/api/auth/signout`, {
        method: 'POST',
        headers: { cookie, 'content-type': 'application/x-www-form-urlencoded' },
        body: new URLSearchParams({ csrfToken: token, json: 'true' }),
      }),
      { params: Promise.resolve({ nextauth: ['signout'] }) },
    );
    expect(signOut.status).toBeLessThan(400);
    expect(await meStatus(cookie)).toBe(401);
    expect(await meStatus(other)).toBe(401);
    expect(await sessionBody(cookie)).toEqual({});
  });

  it('a password change ends the other sessions', async () => {
    const other = await signIn(ACCOUNTS.editor);
    const here = await signIn(ACCOUNTS.editor);
    setRequestHeaders({ cookie: here });
    const body = {
      currentPassword: DEMO_PASSWORD,
      newPassword: 'a-new-long-password',
      confirmPassword: 'a-new-long-password',
    };
    const res = await password.POST(
      new Request(`${ORIGIN}/api/account/password`, {
        method: 'POST',
        headers: { cookie: here, 'content-type': 'application/json', origin: ORIGIN },
        body: JSON.stringify(body),
      }),
      {},
    );
    expect(res.status).toBe(200);
    expect(await meStatus(other)).toBe(401);
    expect(await meStatus(here)).toBe(401);
    expect(await meStatus(await signIn(ACCOUNTS.editor, 'a-new-long-password'))).toBe(200);
  });

  it('disabling ends the session, and re-enabling does not bring the old cookie back', async () => {
    const cookie = await signIn(ACCOUNTS.buyer);
    const admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    const buyer = await userId(ACCOUNTS.buyer);
    await updateUser(admin, buyer, { disabled: true });
    expect(await meStatus(cookie)).toBe(401);
    await updateUser(admin, buyer, { disabled: false });
    expect(await meStatus(cookie)).toBe(401);
    expect(await sessionBody(cookie)).toEqual({});
  });

  it('a role change ends the session', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    await updateUser(admin, await userId(ACCOUNTS.engineer), { role: 'buyer' });
    expect(await meStatus(cookie)).toBe(401);
    await updateUser(admin, await userId(ACCOUNTS.engineer), { role: 'engineer' });
  });

  it('"sign out everywhere" ends every session of that user only', async () => {
    const a = await signIn(ACCOUNTS.engineer);
    const b = await signIn(ACCOUNTS.engineer);
    const someoneElse = await signIn(ACCOUNTS.admin);
    setRequestHeaders({ cookie: a, origin: ORIGIN });
    expect((await signOutEverywhereAction()).status).toBe(200);
    expect(await meStatus(a)).toBe(401);
    expect(await meStatus(b)).toBe(401);
    expect(await meStatus(someoneElse)).toBe(200);
  });
});

describe('the session cookie read of routes and actions', () => {
  const NAME = 'next-auth.session-token';
  const tokenOf = (cookie: string) =>
    cookie
      .split('; ')
      .find((c) => c.startsWith(`${NAME}=`))!
      .slice(NAME.length + 1);
  beforeAll(async () => {
    await freshDatabase();
  });
  beforeEach(async () => {
    await db('sign_in_limits').delete();
    vi.useRealTimers();
  });

  it('leaves a fresh cookie alone and renews one over an hour old, with the same claims', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    expect(await meStatus(cookie)).toBe(200);
    expect(requestState.setCookies).toEqual([]);
    // Two hours on: inside the 8-hour lifetime, past the one-hour renewal age.
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 2 * 3600e3 });
    expect(await meStatus(cookie)).toBe(200);
    expect(requestState.setCookies.map((c) => c.name)).toEqual([NAME]);
    const renewed = requestState.setCookies[0];
    expect(renewed.options).toMatchObject({ httpOnly: true, sameSite: 'lax', path: '/' });
    const secret = process.env.NEXTAUTH_SECRET!;
    const before = (await decodeSessionToken({ token: tokenOf(cookie), secret }))!;
    const after = (await decodeSessionToken({ token: renewed.value, secret }))!;
    expect({ sub: after.sub, gen: after.gen, role: after.role }).toEqual({
      sub: before.sub,
      gen: before.gen,
      role: before.role,
    });
    // Whole seconds: the new expiry is 8 h from the faked now, two hours after the first.
    expect(Number(after.exp) - Number(before.exp)).toBeGreaterThanOrEqual(2 * 3600 - 2);
  });

  it('refuses an expired cookie, a damaged one and none at all, and joins a chunked one', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const token = tokenOf(cookie);
    const others = cookie
      .split('; ')
      .filter((c) => !c.startsWith(`${NAME}=`))
      .join('; ');
    expect(
      await meStatus(`${others}; ${NAME}.0=${token.slice(0, 100)}; ${NAME}.1=${token.slice(100)}`),
    ).toBe(200);
    expect(await meStatus(`${others}; ${NAME}=${token.slice(0, -4)}AAAA`)).toBe(401);
    expect(await meStatus(others)).toBe(401);
    // Nine hours on: past the 8-hour lifetime (and next-auth's 15 s leeway).
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 9 * 3600e3 });
    expect(await meStatus(cookie)).toBe(401);
    vi.useRealTimers();
  });
});
