import { beforeAll, describe, expect, it } from 'vitest';
import '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { authOptions } from '@/auth';
import { db } from '@/lib/db';
import { lockedForMs, MAX_FAILURES, throttleKey } from '@/lib/auth/throttle';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';

type Authorize = (c: Record<string, string>) => Promise<{ id: string; role: string } | null>;
const provider = authOptions.providers[0] as unknown as { options: { authorize: Authorize } };
const authorize = (email: string, password: string) =>
  provider.options.authorize({ email, password });

describe('credentials sign-in', () => {
  beforeAll(async () => {
    await freshDatabase();
  });

  it('signs in a seeded user with the role in the result', async () => {
    const user = await authorize(ACCOUNTS.editor, DEMO_PASSWORD);
    expect(user?.role).toBe('editor');
    expect(Number(user?.id)).toBe(await userId(ACCOUNTS.editor));
  });

  it('refuses a disabled account', async () => {
    await db('users').where({ email: ACCOUNTS.buyer }).update({ disabled: true });
    expect(await authorize(ACCOUNTS.buyer, DEMO_PASSWORD)).toBeNull();
    await db('users').where({ email: ACCOUNTS.buyer }).update({ disabled: false });
  });

  it(`slows, then locks out after ${MAX_FAILURES} failures, and the API answers 429`, async () => {
    const email = ACCOUNTS.engineer;
    const times: number[] = [];
    for (let i = 0; i < MAX_FAILURES; i++) {
      const t0 = performance.now();
      expect(await authorize(email, 'wrong-password')).toBeNull();
      times.push(performance.now() - t0);
    }
    // Each failure adds a delay, so the last attempt is slower than the first.
    expect(times[MAX_FAILURES - 1]).toBeGreaterThan(times[0]);
    expect(await lockedForMs(throttleKey(email))).toBeGreaterThan(0);
    // Even the right password is refused while locked.
    await expect(authorize(email, DEMO_PASSWORD)).rejects.toThrow('RateLimited');

    const body = new URLSearchParams({
      email,
      password: DEMO_PASSWORD,
      csrfToken: 'x',
      json: 'true',
    });
    const res = await nextauth.POST(
      new Request('http://tenderline.test/api/auth/callback/credentials', {
        method: 'POST',
        body,
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
      }),
      { params: Promise.resolve({ nextauth: ['callback', 'credentials'] }) },
    );
    expect(res.status).toBe(429);
    expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await res.json()).message).toMatch(/Too many failed sign-ins/);

    // Another account is unaffected.
    expect(await authorize(ACCOUNTS.admin, DEMO_PASSWORD)).not.toBeNull();
  });
});
