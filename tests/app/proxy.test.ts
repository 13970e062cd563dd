import { afterEach, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import proxy from '@/proxy';

const saved = process.env.APP_URL;
afterEach(() => {
  process.env.APP_URL = saved;
});

describe('proxy: the first layer in front of pages', () => {
  it('gives every page a fresh script nonce in its policy', async () => {
    const a = await proxy(new NextRequest('http://tenderline.test/sign-in'));
    const b = await proxy(new NextRequest('http://tenderline.test/sign-in'));
    const nonce = (r: Response) =>
      r.headers.get('content-security-policy')!.match(/'nonce-([^']+)'/)![1];
    expect(nonce(a)).not.toBe(nonce(b));
    expect(a.headers.get('strict-transport-security')).toBeNull();
  });

  it('sends HSTS and upgrade-insecure-requests only when the app is served over https', async () => {
    process.env.APP_URL = 'https://tenderline.example';
    const r = await proxy(new NextRequest('https://tenderline.example/sign-in'));
    expect(r.headers.get('strict-transport-security')).toBe('max-age=63072000; includeSubDomains');
    expect(r.headers.get('content-security-policy')).toContain('upgrade-insecure-requests');
  });

  it('turns a signed-out visitor to a page away to sign-in, keeping where they were going', async () => {
    const r = await proxy(new NextRequest('http://tenderline.test/admin/users?tab=1'));
    expect(r.status).toBe(307);
    expect(r.headers.get('location')).toBe(
      'http://tenderline.test/sign-in?callbackUrl=%2Fadmin%2Fusers%3Ftab%3D1',
    );
  });

  it('refuses a foreign server-action post with 403 and a form post naming no action with 400', async () => {
    const foreign = await proxy(
      new NextRequest('http://tenderline.test/admin/users', {
        method: 'POST',
        headers: { origin: 'http://127.0.0.1:4999', 'next-action': 'abc' },
        body: '[]',
      }),
    );
    expect(foreign.status).toBe(403);
    const form = new FormData();
    form.set('role', 'admin');
    const noAction = await proxy(
      new NextRequest('http://tenderline.test/admin/users', { method: 'POST', body: form }),
    );
    expect(noAction.status).toBe(400);
    expect((await noAction.json()).message).toContain('names no action');
  });
});
