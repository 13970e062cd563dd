import { createHash } from 'node:crypto';
import { vi, afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { requestState, setRequestHeaders } from '../support/request';
import { countRows, freshDatabase, userId } from '../support/db';
import { linkIn, startTestCatcher, waitForMail } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { meStatus, ORIGIN, proxyPage, SESSION_COOKIE, signIn } from '../support/next-auth';
import { db } from '@/lib/db';
import { createInvitation } from '@/lib/data/invitations';
import { getActiveActor } from '@/lib/data/users';
import { getCurrentActor } from '@/lib/auth/session';
import { acceptInvitationAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';
import type { Actor } from '@/lib/auth/actor';

// No session mock: the real cookie, session rows and readers (as tests/integration/sessions.test.ts).
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

const PASSWORD = 'invitee-password-01';
// Written out here, not read from the app: 8 hours, the session's life from its last renewal.
const LIFE_MS = 8 * 3600e3;
const savedAppUrl = process.env.APP_URL;

function form(token: string, password = PASSWORD) {
  const f = new FormData();
  for (const [k, v] of Object.entries({
    token,
    name: 'Visiting QA',
    password,
    confirmPassword: password,
  }))
    f.set(k, v);
  return f;
}

/** Run the accept action; a redirect (Next's control flow) comes back as its target. */
async function accept(token: string, headers: Record<string, string>, password = PASSWORD) {
  setRequestHeaders(headers);
  try {
    return { state: await acceptInvitationAction(initialActionState, form(token, password)) };
  } catch (error) {
    const digest = String((error as { digest?: unknown }).digest ?? '');
    if (!digest.startsWith('NEXT_REDIRECT;')) throw error;
    return { redirectedTo: digest.split(';')[2] };
  }
}

const sessionCookieSet = () => requestState.setCookies.find((c) => c.name === SESSION_COOKIE);

/** Each reader of the session with this cookie: a page, a route, the proxy. */
async function readers(cookie: string) {
  setRequestHeaders({ cookie });
  return {
    page: (await getCurrentActor())?.email ?? null,
    route: await meStatus(cookie),
    proxy: (await proxyPage(cookie)).status,
  };
}

describe('accepting an invitation signs the new user in', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  let admin: Actor;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
  });
  beforeEach(async () => {
    await db('sign_in_limits').delete();
  });
  afterEach(() => {
    process.env.APP_URL = savedAppUrl;
  });
  afterAll(() => catcher.close());

  async function invite(email: string) {
    await createInvitation(admin, { email, role: 'buyer' });
    return linkIn((await waitForMail(email)).text_body).token;
  }

  it('opens the home page with a session cookie as a sign-in sets it', async () => {
    const email = 'signed-in.qa@orchard-buyer.example';
    const token = await invite(email);
    const before = Date.now();
    const outcome = await accept(token, { origin: ORIGIN, cookie: `tl_invite=${token}` });
    expect(outcome).toEqual({ redirectedTo: '/' });

    const set = sessionCookieSet()!;
    expect(set.options).toMatchObject({
      httpOnly: true,
      sameSite: 'lax',
      path: '/',
      secure: false,
    });
    const expires = (set.options.expires as Date).getTime();
    // ±5 s: the time between `before` and the cookie being written, with room for a slow runner.
    expect(Math.abs(expires - before - LIFE_MS)).toBeLessThan(5000);
    // The link's cookie is cleared on its own path.
    expect(requestState.setCookies.find((c) => c.name === 'tl_invite')).toMatchObject({
      value: '',
      options: { path: '/invite', maxAge: 0 },
    });

    // Every reader agrees who this is; the database holds the token's hash only.
    const cookie = `${SESSION_COOKIE}=${set.value}`;
    expect(await readers(cookie)).toEqual({ page: email, route: 200, proxy: 200 });
    const id = await userId(email);
    const rows = await db('sessions').where({ user_id: id });
    expect(rows.map((r) => r.id)).toEqual([createHash('sha256').update(set.value).digest('hex')]);
    expect(set.value).toMatch(/^[A-Za-z0-9_-]{43}$/);

    const audit = await db('audit_log').where({ action: 'sign-in.success', actor_id: id });
    expect(audit.map((a) => JSON.parse(a.detail))).toEqual([{ email, via: 'invitation' }]);
  });

  it('ends the session the browser held before (a shared machine), not other devices', async () => {
    const onThisBrowser = await signIn(ACCOUNTS.engineer);
    const elsewhere = await signIn(ACCOUNTS.engineer);
    const email = 'shared-desk@orchard-buyer.example';
    const token = await invite(email);
    await accept(token, { origin: ORIGIN, cookie: `${onThisBrowser}; tl_invite=${token}` });
    const cookie = `${SESSION_COOKIE}=${sessionCookieSet()!.value}`;
    expect((await readers(onThisBrowser)).page).toBeNull();
    expect((await readers(elsewhere)).page).toBe(ACCOUNTS.engineer);
    expect((await readers(cookie)).page).toBe(email);
  });

  it('is Secure, under the __Secure- name, when the app is served over https', async () => {
    process.env.APP_URL = 'https://tenderline.example';
    const token = await invite('secure@orchard-buyer.example');
    await accept(token, { origin: 'https://tenderline.example' });
    const set = requestState.setCookies.find((c) => c.name === `__Secure-${SESSION_COOKIE}`);
    expect(set?.options).toMatchObject({ httpOnly: true, sameSite: 'lax', secure: true });
  });

  it.each([
    ['from a foreign page', { origin: 'https://evil.example' }, PASSWORD, 403],
    ['with a too-short password', { origin: ORIGIN }, 'short', 400],
  ])('signs no one in %s', async (_name, headers, password, status) => {
    const email = `refused.${status}@orchard-buyer.example`;
    const token = await invite(email);
    const sessions = await countRows('sessions');
    const outcome = await accept(token, headers, password);
    expect(outcome.state?.status).toBe(status);
    expect(requestState.setCookies).toEqual([]);
    expect(await countRows('sessions')).toBe(sessions);
    expect(await db('users').where({ email }).first()).toBeUndefined();
  });

  it('signs no one in with a link already used (410)', async () => {
    const token = await invite('used@orchard-buyer.example');
    await accept(token, { origin: ORIGIN });
    const sessions = await countRows('sessions');
    const again = await accept(token, { origin: ORIGIN });
    expect(again.state?.status).toBe(410);
    expect(again.state?.message).toContain('already been used');
    expect(requestState.setCookies).toEqual([]);
    expect(await countRows('sessions')).toBe(sessions);
  });
});
