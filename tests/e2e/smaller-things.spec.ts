import { expectNoSidewaysScroll, inviteByApi } from './invitation-helpers';
import { expect, test } from './fixtures';

const SHOTS = process.env.SHOTS_DIR ?? 'tests/artifacts';

/** Every date-like text on the page, for the one-format check. */
async function dateTexts(page: import('@playwright/test').Page): Promise<string[]> {
  const body = await page.locator('main').innerText();
  return (
    body.match(
      /\b\d{4}-\d{2}-\d{2}[^\n·]{0,12}|\b(Mon|Tue|Wed|Thu|Fri|Sat|Sun), \d{2} \w{3} \d{4}[^\n]*/g,
    ) ?? []
  );
}

test('dates read one way on the admin pages: 2026-12-02 or 2026-12-02 14:05 UTC', async ({
  page,
  signInAs,
}) => {
  await signInAs('admin');
  await inviteByApi(page, `dates.${Date.now()}@fig-buyer.example`);
  for (const path of ['/admin/audit', '/admin/outbox', '/admin/users']) {
    await page.goto(path);
    const main = await page.locator('main').innerText();
    expect(main, path).not.toContain('GMT');
    expect(main, path).not.toMatch(/\d{2}:\d{2}:\d{2}/);
    const dates = await dateTexts(page);
    // The audit log and the outbox always hold the invitation just made; the users page shows
    // it only while it is pending (another test may have ended it), so dates are checked there
    // when shown.
    if (path !== '/admin/users') expect(dates.length, `${path} shows dates`).toBeGreaterThan(0);
    for (const d of dates) expect(d.trim(), path).toMatch(/^\d{4}-\d{2}-\d{2}( \d{2}:\d{2} UTC)?/);
  }
});

test('the audit log reads in words and filters by action, person and day', async ({
  page,
  signInAs,
}) => {
  await signInAs('admin');
  const email = `audit.${Date.now()}@pear-buyer.example`;
  await inviteByApi(page, email);
  await page.goto('/admin/audit');
  const list = page.getByTestId('audit-list');
  await expect(list).not.toContainText('{"');
  await expect(list).not.toContainText('invitation.create');

  const filters = page.getByTestId('audit-filters');
  await filters.getByLabel('Action').selectOption({ label: 'Invitation sent' });
  await filters.getByLabel('Who').selectOption({ label: 'Mara Oduya (admin@kestrelvale.example)' });
  const today = new Date().toISOString().slice(0, 10);
  await filters.getByLabel('From (UTC)').fill(today);
  await filters.getByLabel('To (UTC)').fill(today);
  await filters.getByRole('button', { name: 'Filter' }).click();
  await expect(page).toHaveURL(/action=invitation\.create/);
  const entries = page.getByTestId('audit-entry');
  await expect(entries.first()).toContainText(`Invited ${email} as buyer`);
  await expect(entries.first()).toContainText(`invitation of ${email} as buyer`);
  for (const text of await entries.allInnerTexts()) expect(text).toContain('Invited');
  await page.screenshot({ path: `${SHOTS}/audit-filtered-1280.png`, fullPage: true });
  await page.setViewportSize({ width: 390, height: 900 });
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: `${SHOTS}/audit-filtered-390.png`, fullPage: true });
  await page.setViewportSize({ width: 1280, height: 900 });

  // A bad day in the address is named beside its field, not a crash.
  await page.goto('/admin/audit?from=yesterday');
  await expect(page.getByTestId('audit-filters')).toContainText(
    'Give the first day as 2026-12-01.',
  );
  await expect(page.getByTestId('form-error')).toContainText('The filter was not applied');
});

test('the audit log stays closed to an editor', async ({ page, signInAs }) => {
  await signInAs('editor');
  const response = await page.goto('/admin/audit?action=user.update');
  expect(response?.status()).toBe(403);
  await expect(page.getByTestId('forbidden-page')).toBeVisible();
});

test('an article links the checks for an engineer and not for a buyer', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto('/atlas/tomato');
  const link = page.getByRole('link', { name: 'squeeze check' });
  await expect(link).toHaveAttribute('href', '/checks/squeeze');
  await page.context().clearCookies();

  await signInAs('buyer');
  await page.goto('/atlas/tomato');
  await expect(page.getByText(/the squeeze check has nothing to judge against/)).toBeVisible();
  await expect(page.locator('main a[href^="/checks"]')).toHaveCount(0);
  await expect(page.locator('main')).not.toContainText('Checks page');
});

test('the data gaps page lists the values from memory for checking', async ({ page, signInAs }) => {
  await signInAs('editor');
  await page.goto('/editor/gaps');
  await expect(page.getByRole('heading', { name: 'Values from memory, to check' })).toBeVisible();
  const finney = page
    .getByTestId('from-memory-value')
    .filter({ hasText: 'Finney 1967 (from memory, not yet checked)' });
  await expect(finney.first()).toBeVisible();
  await expect(finney.first().getByRole('link')).toHaveAttribute('href', /^\/properties\/potato/);
  await expect(page.locator('main')).not.toContainText('Recalled, not yet checked');
});
