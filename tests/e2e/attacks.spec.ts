import http from 'node:http';
import { expect, test } from '@playwright/test';
import { ACCOUNTS, PASSWORD, signIn, signOut } from './helpers';
import { APP, postSignIn, rawRequest, rawStatus } from './raw-http';

// Each attack of the foundation review, run against the real server as an attacker would.

const EVIL_PORT = 4999;
const EVIL_EMAIL = 'attacker.admin@elsewhere.example';

/** A page on another loopback port (same site, other origin) that auto-submits a forged form. */
function forgedPage(action: string, enctype: string, fields: Record<string, string>) {
  const inputs = Object.entries(fields)
    .map(([name, value]) => `<input type="hidden" name='${name}' value='${value}'>`)
    .join('');
  return `<!doctype html><body><form id="f" method="POST" action="${APP.origin}${action}" enctype="${enctype}">${inputs}</form><script>document.getElementById('f').submit()</script></body>`;
}

function serveOnce(html: string): Promise<http.Server> {
  return new Promise((resolve) => {
    const server = http.createServer((_req, res) => {
      res.writeHead(200, { 'content-type': 'text/html' });
      res.end(html);
    });
    server.listen(EVIL_PORT, '127.0.0.1', () => resolve(server));
  });
}

test('a forged text/plain JSON form from another port cannot invite an admin', async ({ page }) => {
  await signIn(page, ACCOUNTS.admin);
  // The body the browser sends is `{"email":"…","role":"admin","x":"=…"}`: valid JSON.
  const name = `{"email":"${EVIL_EMAIL}","role":"admin","x":"`;
  const evil = await serveOnce(forgedPage('/api/invitations', 'text/plain', { [name]: '"}' }));
  try {
    const answer = page.waitForResponse((r) => r.url().endsWith('/api/invitations'));
    await page.goto(`http://127.0.0.1:${EVIL_PORT}/`);
    expect((await answer).status()).toBe(403);
  } finally {
    evil.close();
  }
  const users = await (await page.request.get('/api/admin/users')).json();
  expect(users.users.map((u: { email: string }) => u.email)).not.toContain(EVIL_EMAIL);
  const outbox = await (await page.request.get('/api/admin/outbox')).json();
  expect(JSON.stringify(outbox)).not.toContain(EVIL_EMAIL);
});

test('a forged server-action post from another port gets a plain 403', async ({ page }) => {
  await signIn(page, ACCOUNTS.admin);
  const evil = await serveOnce(
    forgedPage('/admin/users', 'multipart/form-data', { $ACTION_ID_0: '', role: 'admin' }),
  );
  try {
    const answer = page.waitForResponse((r) => r.url().endsWith('/admin/users'));
    await page.goto(`http://127.0.0.1:${EVIL_PORT}/`);
    expect((await answer).status()).toBe(403);
  } finally {
    evil.close();
  }
});

test('wrong passwords from 127.0.0.2 lock that address, not the owner at 127.0.0.1', async ({
  page,
}) => {
  const statuses: number[] = [];
  for (let i = 0; i < 7; i++) {
    statuses.push((await postSignIn(ACCOUNTS.editor, `guess-${i}`, '127.0.0.2')).status);
  }
  expect(statuses.slice(5)).toEqual([429, 429]);
  expect((await postSignIn(ACCOUNTS.editor, PASSWORD, '127.0.0.2')).status).toBe(429);
  await signIn(page, ACCOUNTS.editor); // the browser connects from 127.0.0.1
  await expect(page.getByTestId('account-link')).toContainText('editor');
  // Wait for the sign-out to land on the sign-in page before the next goto, or the two
  // navigations race and one is aborted.
  await signOut(page);

  // An admin sees the lock and clears it; the locked address may try again.
  await signIn(page, ACCOUNTS.admin);
  await page.goto('/admin/users');
  const locks = page.getByTestId('sign-in-locks');
  await expect(locks).toContainText(ACCOUNTS.editor);
  await expect(locks).toContainText('127.0.0.2');
  await page.screenshot({ path: 'tests/artifacts/admin-sign-in-locks.png', fullPage: true });
  await locks.getByRole('button', { name: `Clear the sign-in lock of ${ACCOUNTS.editor}` }).click();
  // The cleared lock leaves the list (the page re-renders from the server).
  await expect(
    page.getByTestId('admin-sign-in-locks-section').or(page.locator('main')),
  ).not.toContainText('Locked from 127.0.0.2');
  const after = await postSignIn(ACCOUNTS.editor, PASSWORD, '127.0.0.2');
  expect(after.status).toBe(200);
  expect(JSON.parse(after.body).url).not.toContain('error=');
});

test('odd requests get a 4xx with a plain message, never a 500', async ({ page }) => {
  const get = await rawRequest({ method: 'GET', path: '/api/auth/callback/credentials' });
  expect(get.status).toBe(405);
  const json = await rawRequest({
    method: 'POST',
    path: '/api/auth/callback/credentials',
    headers: { 'content-type': 'application/json', 'content-length': '9' },
    body: '{"email":',
  });
  expect(json.status).toBe(415);
  const multipart = await page.request.post('/admin/users', {
    multipart: { anything: 'here' },
    headers: { origin: APP.origin },
  });
  expect(multipart.status()).toBe(400);
  const proto = await page.goto('/sign-in?error=__proto__');
  expect(proto?.status()).toBe(200);
  await expect(page.getByTestId('form-error')).toContainText('Sign-in failed');

  await signIn(page, ACCOUNTS.admin);
  for (const id of ['0x1', '%201', '00005', '1e3']) {
    const res = await page.request.patch(`/api/admin/users/${id}`, {
      data: { role: 'buyer' },
      headers: { origin: APP.origin },
    });
    expect(res.status(), id).toBe(400);
  }
});

test('bodies are refused by size before they are read', async () => {
  const hundredMb = 100 * 1024 * 1024;
  const head = (path: string, extra = '') =>
    `POST ${path} HTTP/1.1\r\nHost: ${APP.host}\r\nContent-Type: application/json\r\n${extra}\r\n`;
  // Declares 100 MB, sends 64 KB, and gets its answer without sending the rest.
  const chunk = Buffer.alloc(64 * 1024, 'x');
  expect(await rawStatus(head('/api/invitations', `Content-Length: ${hundredMb}\r\n`), chunk)).toBe(
    413,
  );
  expect(
    await rawStatus(head('/admin/users', `Content-Length: ${2 * 1024 * 1024}\r\n`), chunk),
  ).toBe(413);
  expect(
    await rawStatus(head('/api/invitations', 'Transfer-Encoding: chunked\r\n'), '10\r\n'),
  ).toBe(411);
});
