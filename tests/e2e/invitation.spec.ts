import { expect, test } from '@playwright/test';
import { ACCOUNTS, signIn, signOut } from './helpers';
import { inviteByApi, latestLinkTo } from './invitation-helpers';

test('an admin invites a buyer, who accepts through the e-mailed link and is signed in', async ({
  page,
}) => {
  const buyerEmail = `visiting.qa.${Date.now()}@orchardbuyer.example`;
  await signIn(page, ACCOUNTS.admin);
  await page.goto('/admin/users');
  const form = page.getByTestId('invite-form');
  await form.getByLabel('E-mail of the person to invite').fill(buyerEmail);
  await form.getByLabel('Role').selectOption('buyer');
  await form.getByRole('button', { name: 'Send invitation' }).click();
  await expect(form.getByTestId('form-success')).toContainText(buyerEmail);
  await expect(page.getByTestId(`invitation-row-${buyerEmail}`)).toContainText('Mara Oduya');
  await page.screenshot({ path: 'tests/artifacts/admin-users.png', fullPage: true });

  // The message went over SMTP to the catcher; read the link from the admin outbox.
  await page.goto('/admin/outbox');
  const message = page.getByTestId('outbox-message').filter({ hasText: buyerEmail }).first();
  await expect(message).toBeVisible();
  const body = await message.getByTestId('outbox-body').innerText();
  const link = body.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)?.[0];
  expect(link, 'invitation link in the e-mail').toBeTruthy();
  // The outbox shows the address as a link that opens it.
  await expect(message.getByRole('link', { name: link! })).toHaveAttribute('href', link!);
  await signOut(page);

  // The link hands its token to the accept page and leaves the address bar.
  await page.goto(link!);
  await expect(page).toHaveURL(/\/invite\/accept$/);
  await page.getByLabel('Your name').fill('Visiting QA');
  await page.getByLabel('Password', { exact: true }).fill('a-long-buyer-password');
  await page.getByLabel('Repeat password').fill('a-long-buyer-password');
  await page.getByRole('button', { name: 'Create account' }).click();
  // Signed in straight away: the buyer's home, no second sign-in with the new password.
  await expect(page).toHaveURL(/\/$/);
  await expect(page.getByTestId('area-nav').getByRole('link')).toHaveText(['Atlas', 'Properties']);
  await expect(page.getByText('Visiting QA (buyer)')).toBeVisible();
  await signOut(page);

  // The link is single use: 410 Gone, in plain words.
  const used = await page.goto(link!);
  expect(used?.status()).toBe(410);
  await expect(page.getByTestId('invitation-problem')).toContainText('already been used');
  // A tampered link is unknown: 404 with a clear page, not a crash.
  const tampered = await page.goto(link!.slice(0, -3) + 'xyz');
  expect(tampered?.status()).toBe(404);
  await expect(page.getByTestId('invitation-problem')).toContainText('not valid');
  await page.screenshot({ path: 'tests/artifacts/invitation-invalid.png' });

  await signIn(page, buyerEmail, 'a-long-buyer-password');
  await expect(page.getByTestId('area-nav').getByRole('link')).toHaveText(['Atlas', 'Properties']);
});

test('resend and invite-again replace the old link (410); revoke withdraws it', async ({
  page,
  context,
}) => {
  const email = `replaced.${Date.now()}@plum-buyer.example`;
  await signIn(page, ACCOUNTS.admin);
  await inviteByApi(page, email);
  const first = await latestLinkTo(page, email);

  // Resend from the pending list: a new link is mailed and the first one stops working.
  await page.goto('/admin/users');
  const row = page.getByTestId(`invitation-row-${email}`);
  await row.getByRole('button', { name: /^Resend/ }).click();
  await expect(page.getByTestId(`invitation-row-${email}`)).toContainText('new link was e-mailed');
  const second = await latestLinkTo(page, email);
  expect(second).not.toBe(first);

  // Inviting the same address again replaces the resent link too.
  await inviteByApi(page, email);
  const third = await latestLinkTo(page, email);
  expect(third).not.toBe(second);

  // Revoke the newest from the list; it then says it was withdrawn.
  await page.goto('/admin/users');
  await page
    .getByTestId(`invitation-row-${email}`)
    .getByRole('button', { name: /^Revoke/ })
    .click();
  await expect(page.getByTestId(`invitation-row-${email}`)).toHaveCount(0);

  await context.clearCookies();
  for (const old of [first, second]) {
    const response = await page.goto(old);
    expect(response?.status()).toBe(410);
    await expect(page.getByTestId('invitation-problem')).toContainText('replaced by a newer one');
  }
  await page.screenshot({ path: 'tests/artifacts/invitation-replaced.png' });
  const revoked = await page.goto(third);
  expect(revoked?.status()).toBe(410);
  await expect(page.getByTestId('invitation-problem')).toContainText('withdrawn');

  // The accept page opened directly, without a link, is not found.
  const direct = await page.goto('/invite/accept');
  expect(direct?.status()).toBe(404);
  await expect(page.getByTestId('invitation-problem')).toContainText('opens from the link');
});
