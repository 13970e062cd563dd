import { expect, test } from '@playwright/test';
import { ACCOUNTS, signIn } from './helpers';
import {
  expectNoSidewaysScroll,
  expectWithinWidth,
  inviteByApi,
  latestLinkTo,
} from './invitation-helpers';

// A common phone: 390 × 844 CSS pixels. Every page must fit its width without sideways scroll.
test.use({ viewport: { width: 390, height: 844 } });

const shot = (name: string) => `tests/artifacts/phone-${name}.png`;

test('accept-invitation page fits, and keeps the typed name after a password error', async ({
  page,
  context,
}) => {
  const email = `a.very.long.address.for.visiting.quality.${Date.now()}@stone-fruit-buyers.example`;
  await signIn(page, ACCOUNTS.admin);
  await inviteByApi(page, email);
  const link = await latestLinkTo(page, email);
  await context.clearCookies();

  const response = await page.goto(link);
  expect(response?.status()).toBe(200);
  expect(page.url()).toMatch(/\/invite\/accept$/);
  await expect(page.getByText(email)).toBeVisible();
  await page.getByLabel('Your name').fill('Ana Ruiz');
  await page.getByLabel('Password', { exact: true }).fill('short');
  await page.getByLabel('Repeat password').fill('short');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByText('at least 10 characters').last()).toBeVisible();
  await expect(page.getByLabel('Your name')).toHaveValue('Ana Ruiz');
  await expectWithinWidth(page, page.getByRole('button', { name: 'Create account' }));
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('accept-invitation'), fullPage: true });
});

test('an ended invitation link answers 410 with a page that fits', async ({ page, context }) => {
  const email = `replaced.on.a.phone.${Date.now()}@kiwi-buyer.example`;
  await signIn(page, ACCOUNTS.admin);
  await inviteByApi(page, email);
  const old = await latestLinkTo(page, email);
  await inviteByApi(page, email);
  await context.clearCookies();
  const response = await page.goto(old);
  expect(response?.status()).toBe(410);
  await expectWithinWidth(page, page.getByTestId('invitation-problem'));
  await expect(page.getByTestId('invitation-problem')).toContainText('replaced by a newer one');
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('invitation-replaced'), fullPage: true });
});

test('admin users: every column, the pending invitations and their buttons fit', async ({
  page,
}) => {
  await signIn(page, ACCOUNTS.admin);
  await inviteByApi(page, `pending.engineer.${Date.now()}@lab-partner.example`, 'engineer');
  await page.goto('/admin/users');
  const engineer = page.getByTestId(`user-row-${ACCOUNTS.engineer}`);
  await expectWithinWidth(page, engineer.getByRole('button', { name: 'Save role' }));
  await expectWithinWidth(page, engineer.getByRole('button', { name: 'Disable' }));
  const pending = page.getByTestId('pending-invitations').getByRole('listitem').first();
  await expectWithinWidth(page, pending.getByRole('button', { name: /^Resend/ }));
  await expectWithinWidth(page, pending.getByRole('button', { name: /^Revoke/ }));

  // The admin's own row cannot be changed, and its buttons look it.
  const own = page
    .getByTestId(`user-row-${ACCOUNTS.admin}`)
    .getByRole('button', { name: 'Disable' });
  await expect(own).toBeDisabled();
  const colour = (l: typeof own) => l.evaluate((el) => getComputedStyle(el).color);
  expect(await colour(own)).not.toBe(
    await colour(engineer.getByRole('button', { name: 'Disable' })),
  );
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('admin-users'), fullPage: true });
});

test('audit log shows every field of an entry on a phone', async ({ page }) => {
  await signIn(page, ACCOUNTS.admin);
  await page.goto('/admin/audit');
  const entry = page.getByTestId('audit-entry').first();
  await expectWithinWidth(page, entry.getByText(/^Action:/));
  await expectWithinWidth(page, entry.getByText(/^Record:/));
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('audit'), fullPage: true });
});

test('outbox wraps long links without splitting ordinary words', async ({ page }) => {
  await signIn(page, ACCOUNTS.admin);
  await inviteByApi(page, `outbox.${Date.now()}@citrus-buyer.example`);
  await page.goto('/admin/outbox');
  const body = page.getByTestId('outbox-body').first();
  await expectWithinWidth(page, body);
  expect(await body.evaluate((el) => getComputedStyle(el).wordBreak)).not.toBe('break-all');
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('outbox'), fullPage: true });
});

test('404 keeps the header and navigation for a signed-in user', async ({ page }) => {
  await signIn(page, ACCOUNTS.engineer);
  const response = await page.goto('/no-such-area');
  expect(response?.status()).toBe(404);
  await expect(page.getByRole('heading', { name: 'No page here' })).toBeVisible();
  await expect(page.getByTestId('area-nav').getByRole('link')).toHaveText([
    'Atlas',
    'Properties',
    'Checks',
    'Assessments',
  ]);
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('not-found'), fullPage: true });
});

test('403 for a buyer names the refusal in the title, not the page', async ({ page }) => {
  await signIn(page, ACCOUNTS.buyer);
  const response = await page.goto('/admin/users');
  expect(response?.status()).toBe(403);
  await expect(page.getByTestId('forbidden-page')).toContainText('Not open to your role');
  await expect(page).toHaveTitle(/Not open to the buyer role/);
  await expect(page).not.toHaveTitle(/Users/);
  expect(await page.locator('title').allTextContents()).not.toContainEqual(
    expect.stringContaining('Users'),
  );
  await expect(page.getByTestId('area-nav')).toBeVisible();
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('forbidden-buyer'), fullPage: true });
});

test('buyer home promises only what a buyer can use', async ({ page }) => {
  await signIn(page, ACCOUNTS.buyer);
  const cards = page.getByTestId('home-areas');
  await expect(cards.getByRole('heading')).toHaveText(['Atlas', 'Properties']);
  await expect(cards).not.toContainText(/revision history|CSV|drafts/i);
  await expectWithinWidth(page, cards.getByRole('link').last());
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('buyer-home'), fullPage: true });
});
