import { vi, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { requestState, setRequestHeaders } from '../support/request';
import { freshDatabase } from '../support/db';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import {
  csrf,
  meStatus,
  postCredentials,
  proxyPage,
  SESSION_COOKIE,
  signIn,
  tokenOf,
} from '../support/next-auth';
import { db } from '@/lib/db';
import { readSession } from '@/lib/auth/read-session';

// The session cookie's life, written out here (not read from the app): 8 hours from its last
// renewal, renewed once it is an hour old.
const HOUR = 3600e3;
const LIFE = 8 * HOUR;
const savedAppUrl = process.env.APP_URL;

/** Move the clock (Date only; the database and timers keep running). */
const at = (ms: number) => vi.useFakeTimers({ toFake: ['Date'], now: ms });

describe('the session cookie: flags, life and renewal', () => {
  beforeAll(async () => {
    await freshDatabase();
  });
  beforeEach(async () => {
    await db('sign_in_limits').delete();
  });
  afterEach(() => {
    vi.useRealTimers();
    process.env.APP_URL = savedAppUrl;
  });

  it('is set at sign-in HttpOnly, SameSite=Lax, for 8 hours, and not Secure over http', async () => {
    const before = Date.now();
    const response = await postCredentials(ACCOUNTS.engineer, DEMO_PASSWORD, await csrf());
    const cookies = response.headers.getSetCookie();
    const session = cookies.find((c) => c.startsWith(`${SESSION_COOKIE}=`))!;
    expect(session).toMatch(/; HttpOnly/i);
    expect(session).toMatch(/; SameSite=Lax/i);
    expect(session).toMatch(/; Path=\//i);
    expect(session).not.toMatch(/; Secure/i);
    const expires = Date.parse(session.match(/Expires=([^;]+)/i)![1]);
    expect(expires - before).toBeGreaterThan(LIFE - 5000);
    expect(expires - before).toBeLessThan(LIFE + 5000);
  });

  it('is Secure, under the __Secure- name, when the app is served over https', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const token = tokenOf(cookie);
    process.env.APP_URL = 'https://tenderline.example';
    // Renewal re-sends the cookie: over https it carries the Secure flag.
    at(Date.now() + 2 * HOUR);
    const jar = { get: () => ({ value: token }), set: vi.fn() };
    expect(await readSession(jar)).not.toBeNull();
    expect(jar.set).toHaveBeenCalledWith(
      `__Secure-${SESSION_COOKIE}`,
      token,
      expect.objectContaining({ secure: true, httpOnly: true, sameSite: 'lax', path: '/' }),
    );
  });

  it('is left alone while fresh and renewed (row and cookie) once an hour old', async () => {
    const start = Date.now();
    const cookie = await signIn(ACCOUNTS.engineer);
    expect(await meStatus(cookie)).toBe(200);
    expect(requestState.setCookies).toEqual([]);
    at(start + 2 * HOUR);
    expect(await meStatus(cookie)).toBe(200);
    expect(requestState.setCookies.map((c) => [c.name, c.value])).toEqual([
      [SESSION_COOKIE, tokenOf(cookie)],
    ]);
    const renewed = requestState.setCookies[0].options as { expires: Date; httpOnly: boolean };
    expect(renewed).toMatchObject({ httpOnly: true, sameSite: 'lax', path: '/', secure: false });
    expect(renewed.expires.getTime()).toBe(start + 2 * HOUR + LIFE);
  });

  it('the proxy renews it on the answer to a page, which a page render cannot', async () => {
    const start = Date.now();
    const cookie = await signIn(ACCOUNTS.engineer);
    expect((await proxyPage(cookie)).headers.getSetCookie()).toEqual([]);
    at(start + 3 * HOUR);
    const renewed = (await proxyPage(cookie)).headers.getSetCookie();
    expect(renewed).toHaveLength(1);
    expect(renewed[0]).toMatch(new RegExp(`^${SESSION_COOKIE}=${tokenOf(cookie)};`));
    expect(renewed[0]).toMatch(/; HttpOnly/i);
  });

  it('ends 8 hours after its last renewal, and use keeps it going', async () => {
    const start = Date.now();
    const idle = await signIn(ACCOUNTS.engineer);
    const busy = await signIn(ACCOUNTS.engineer);
    at(start + 7 * HOUR);
    expect(await meStatus(busy)).toBe(200);
    at(start + 8 * HOUR + 60e3);
    expect(await meStatus(idle)).toBe(401);
    expect(await meStatus(busy)).toBe(200); // renewed again: 8 hours from now
    at(start + 16 * HOUR + 2 * 60e3);
    expect(await meStatus(busy)).toBe(401);
  });

  it('refuses a damaged token, an unknown one and none at all', async () => {
    const cookie = await signIn(ACCOUNTS.engineer);
    const token = tokenOf(cookie);
    const others = cookie
      .split('; ')
      .filter((c) => !c.startsWith(`${SESSION_COOKIE}=`))
      .join('; ');
    expect(await meStatus(`${others}; ${SESSION_COOKIE}=${token.slice(0, -4)}AAAA`)).toBe(401);
    expect(await meStatus(`${others}; ${SESSION_COOKIE}=x`)).toBe(401);
    expect(await meStatus(others)).toBe(401);
    setRequestHeaders();
    expect(await readSession()).toBeNull();
  });
});
