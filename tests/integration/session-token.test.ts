import { decode, encode } from 'next-auth/jwt';
import { describe, expect, it } from 'vitest';
import { decodeSessionToken, encodeSessionToken } from '@/lib/auth/session-token';

// The cached-key codec against next-auth's own encode/decode (the independent reference): the
// same secret must read each other's cookies, so nobody is signed out when the codec changes.
const secret = 'a-test-secret-of-reasonable-length-0123456789';
const claims = { sub: '7', role: 'engineer' as const, gen: 3, name: 'Test', email: 't@x.example' };

describe('session token codec', () => {
  it("reads next-auth's tokens and next-auth reads ours", async () => {
    const theirs = await encode({ token: claims, secret, maxAge: 3600 });
    expect(await decodeSessionToken({ token: theirs, secret })).toMatchObject(claims);
    const ours = await encodeSessionToken({ token: claims, secret, maxAge: 3600 });
    expect(await decode({ token: ours, secret })).toMatchObject(claims);
  });

  it('sets the lifetime from maxAge', async () => {
    const before = Math.floor(Date.now() / 1000);
    const t = (await decodeSessionToken({
      token: await encodeSessionToken({ token: claims, secret, maxAge: 8 * 3600 }),
      secret,
    }))!;
    // Whole seconds: exp − iat is exactly maxAge; iat is now, within the test's own second or two.
    expect(Number(t.exp) - Number(t.iat)).toBe(8 * 3600);
    expect(Number(t.iat) - before).toBeLessThanOrEqual(2);
  });

  it('refuses a token past its expiry, a damaged one, and one sealed with another secret', async () => {
    const expired = await encodeSessionToken({ token: claims, secret, maxAge: -60 });
    await expect(decodeSessionToken({ token: expired, secret })).rejects.toThrow(/exp/);
    const ours = await encodeSessionToken({ token: claims, secret, maxAge: 3600 });
    const parts = ours.split('.');
    const body = parts[3];
    parts[3] = (body[0] === 'A' ? 'B' : 'A') + body.slice(1);
    await expect(decodeSessionToken({ token: parts.join('.'), secret })).rejects.toThrow();
    await expect(decodeSessionToken({ token: ours, secret: `${secret}-other` })).rejects.toThrow();
    expect(await decodeSessionToken({ token: '', secret })).toBeNull();
  });
});
