import { ACCOUNTS, expect, test } from './fixtures';
import { APP, rawRequest } from './raw-http';

/** Headers every answer must carry, written out (not read from the app's code). */
function expectBaseline(headers: Record<string, string>) {
  expect(headers['x-frame-options']).toBe('DENY');
  expect(headers['x-content-type-options']).toBe('nosniff');
  expect(headers['referrer-policy']).toBe('strict-origin-when-cross-origin');
  expect(headers['permissions-policy']).toContain('camera=()');
}

test('pages carry a nonce CSP and hydrate under it with no violation', async ({
  page,
  signInAs,
}) => {
  await page.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { cspViolations: string[] }).cspViolations = seen;
    document.addEventListener('securitypolicyviolation', (e) =>
      seen.push(`${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  const response = await page.goto('/sign-in');
  const headers = response!.headers();
  expectBaseline(headers);
  const csp = headers['content-security-policy'];
  expect(csp).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toContain("object-src 'none'");
  // Signing in needs the page's JavaScript: it only works if the scripts ran under the policy.
  await signInAs('engineer');
  await page.goto('/account');
  const violations = await page.evaluate(
    () => (window as unknown as { cspViolations: string[] }).cspViolations,
  );
  expect(violations).toEqual([]);
});

test('API answers and the sign-in callback carry the headers and are never cached', async () => {
  const api = await rawRequest({ method: 'GET', path: '/api/me' });
  expect(api.status).toBe(401);
  expectBaseline(api.headers as Record<string, string>);
  expect(api.headers['cache-control']).toBe('no-store');

  const csrf = await rawRequest({ method: 'GET', path: '/api/auth/csrf' });
  const { csrfToken } = JSON.parse(csrf.body);
  const body = new URLSearchParams({
    email: ACCOUNTS.buyer,
    password: 'wrong',
    csrfToken,
    json: 'true',
  }).toString();
  const callback = await rawRequest({
    method: 'POST',
    path: '/api/auth/callback/credentials',
    headers: {
      'content-type': 'application/x-www-form-urlencoded',
      'content-length': String(body.length),
      origin: APP.origin,
      cookie: (csrf.headers['set-cookie'] ?? []).map((c) => c.split(';')[0]).join('; '),
    },
    body,
  });
  expectBaseline(callback.headers as Record<string, string>);
  expect(callback.headers['cache-control']).toBe('no-store');
});

test('after sign-out the old session cookie opens nothing', async ({
  page,
  browser,
  signInAs,
  shell,
}) => {
  await signInAs('engineer');
  const oldCookies = await page.context().cookies();
  expect((await page.request.get('/api/me')).status()).toBe(200);
  await shell.signOut();

  // A second browser that kept a copy of the cookie, as a thief would.
  const thief = await browser.newContext({ baseURL: APP.origin });
  await thief.addCookies(oldCookies);
  expect((await thief.request.get('/api/me')).status()).toBe(401);
  const session = await (await thief.request.get('/api/auth/session')).json();
  expect(session).toEqual({});
  const home = await thief.newPage();
  await home.goto('/');
  await expect(home).toHaveURL(/\/sign-in/);
  await thief.close();
});

test('"Sign out everywhere" ends a second browser\'s session', async ({
  page,
  browser,
  signInAs,
}) => {
  await signInAs('editor');
  const other = await browser.newContext({ baseURL: APP.origin });
  await other.addCookies(await page.context().cookies());
  expect((await other.request.get('/api/me')).status()).toBe(200);
  await page.goto('/account');
  await page.getByRole('button', { name: 'Sign out everywhere' }).click();
  await expect(page.getByTestId('sign-out-everywhere')).toContainText('Signed out on every device');
  expect((await other.request.get('/api/me')).status()).toBe(401);
  await page.goto('/');
  await expect(page).toHaveURL(/\/sign-in/);
  await other.close();
});

test('the session cookie is HttpOnly, SameSite=Lax, not Secure over http, for 8 hours', async ({
  page,
  signInAs,
}) => {
  await signInAs('buyer');
  const cookies = await page.context().cookies();
  const session = cookies.find((c) => c.name === 'next-auth.session-token')!;
  expect(session).toMatchObject({ httpOnly: true, sameSite: 'Lax', secure: false, path: '/' });
  const left = session.expires * 1000 - Date.now();
  expect(left).toBeGreaterThan(8 * 3600e3 - 120e3);
  expect(left).toBeLessThanOrEqual(8 * 3600e3 + 5e3);
});
