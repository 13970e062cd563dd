import { vi, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { setRequestHeaders } from '../support/request';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { meStatus, ORIGIN, proxyPage, sessionBody, signIn, tokenOf } from '../support/next-auth';
import { db } from '@/lib/db';
import { getActiveActor, updateUser } from '@/lib/data/users';
import { getCurrentActor } from '@/lib/auth/session';
import * as password from '@/app/api/account/password/route';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';
import { signOutEverywhereAction } from '@/lib/actions/account';

// No session mock here: the real cookie, the real session rows, the real readers.
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

/** What each reader of the session makes of a cookie: a page, a route, next-auth's route, the proxy. */
async function readers(cookie: string) {
  setRequestHeaders({ cookie });
  const page = (await getCurrentActor())?.email ?? null;
  const session = (await sessionBody(cookie)) as { user?: { email: string } };
  return {
    page,
    route: await meStatus(cookie),
    sessionRoute: session.user?.email ?? null,
    proxy: (await proxyPage(cookie)).status,
  };
}
const signedIn = (email: string) => ({ page: email, route: 200, sessionRoute: email, proxy: 200 });
const signedOut = { page: null, route: 401, sessionRoute: null, proxy: 307 };

async function signOut(cookie: string) {
  // The CSRF token that belongs to the csrf cookie inside `cookie` (sign-in set both).
  const token = decodeURIComponent(
    cookie
      .split('; ')
      .find((c) => c.startsWith('next-auth.csrf-token='))!
      .split('=')[1],
  ).split('|')[0];
  setRequestHeaders({ cookie, 'content-type': 'application/x-www-form-urlencoded' });
  return nextauth.POST(
    new NextRequest(`${ORIGIN}/api/auth/signout`, {
      method: 'POST',
      headers: { cookie, 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ csrfToken: token, json: 'true' }),
    }),
    { params: Promise.resolve({ nextauth: ['signout'] }) },
  );
}

describe('sessions end when they should, for every reader alike', () => {
  beforeAll(async () => {
    await freshDatabase();
  });
  beforeEach(async () => {
    await db('sign_in_limits').delete();
  });

  it('a live cookie opens pages, routes, the session route and the proxy alike', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    expect(await readers(cookie)).toEqual(signedIn(ACCOUNTS.engineer));
    expect(await sessionBody(cookie)).toHaveProperty('user.role', 'engineer');
  });

  it('after sign-out the old cookie opens nothing; that user elsewhere stays signed in', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const other = await signIn(ACCOUNTS.engineer);
    const out = await signOut(cookie);
    expect(out.status).toBeLessThan(400);
    expect(out.headers.getSetCookie().join()).toMatch(/next-auth\.session-token=;/);
    expect(await readers(cookie)).toEqual(signedOut);
    expect(await sessionBody(cookie)).toEqual({});
    expect(await meStatus(other)).toBe(200);
  });

  it('sign-out without the CSRF token ends nothing', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const forged = cookie.replace(/next-auth\.csrf-token=[^;]+/, 'next-auth.csrf-token=x%7Cy');
    await signOut(forged).catch(() => undefined);
    expect(await meStatus(cookie)).toBe(200);
  });

  it('a password change ends every session of the user, this one too', async () => {
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
    expect(await readers(other)).toEqual(signedOut);
    expect(await readers(here)).toEqual(signedOut);
    expect(await meStatus(await signIn(ACCOUNTS.editor, 'a-new-long-password'))).toBe(200);
  });

  it('disabling ends the session, and re-enabling does not bring the old cookie back', async () => {
    const cookie = await signIn(ACCOUNTS.buyer);
    const admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    const buyer = await userId(ACCOUNTS.buyer);
    await updateUser(admin, buyer, { disabled: true });
    expect(await readers(cookie)).toEqual(signedOut);
    await updateUser(admin, buyer, { disabled: false });
    expect(await readers(cookie)).toEqual(signedOut);
  });

  it('a disabled account has no session even if its rows were somehow left', async () => {
    const cookie = await signIn(ACCOUNTS.buyer);
    await db('users').where({ email: ACCOUNTS.buyer }).update({ disabled: true });
    expect(await readers(cookie)).toEqual(signedOut);
    await db('users').where({ email: ACCOUNTS.buyer }).update({ disabled: false });
    expect(await readers(cookie)).toEqual(signedIn(ACCOUNTS.buyer));
  });

  it('a role change ends the session', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    await updateUser(admin, await userId(ACCOUNTS.engineer), { role: 'buyer' });
    expect(await readers(cookie)).toEqual(signedOut);
    await updateUser(admin, await userId(ACCOUNTS.engineer), { role: 'engineer' });
  });

  it('"sign out everywhere" ends every session of that user only', async () => {
    const a = await signIn(ACCOUNTS.engineer);
    const b = await signIn(ACCOUNTS.engineer);
    const someoneElse = await signIn(ACCOUNTS.admin);
    setRequestHeaders({ cookie: a, origin: ORIGIN });
    expect((await signOutEverywhereAction()).status).toBe(200);
    expect(await readers(a)).toEqual(signedOut);
    // The gap the one read closes: the proxy used to let a still-sealed, revoked token through.
    expect(await readers(b)).toEqual(signedOut);
    expect(await readers(someoneElse)).toEqual(signedIn(ACCOUNTS.admin));
    const id = await userId(ACCOUNTS.engineer);
    expect(await db('sessions').where({ user_id: id })).toEqual([]);
  });

  it('the cookie holds a random token; the database only its hash', async () => {
    const token = tokenOf(await signIn(ACCOUNTS.engineer));
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(await db('sessions').where({ id: token }).first()).toBeUndefined();
    const ids = (await db('sessions').select('id')).map((r) => String(r.id));
    expect(ids.every((id) => /^[0-9a-f]{64}$/.test(id))).toBe(true);
  });
});
