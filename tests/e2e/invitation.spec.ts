import { expect, test } from '@playwright/test';
import { ACCOUNTS, signIn, signOut } from './helpers';

test('an admin invites a buyer, who accepts through the e-mailed link and signs in', async ({
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
  await page.screenshot({ path: 'tests/artifacts/admin-users.png', fullPage: true });

  // The message went over SMTP to the catcher; read the link from the admin outbox.
  await page.goto('/admin/outbox');
  const message = page.getByTestId('outbox-message').filter({ hasText: buyerEmail }).first();
  await expect(message).toBeVisible();
  const body = await message.getByTestId('outbox-body').innerText();
  const link = body.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)?.[0];
  expect(link, 'invitation link in the e-mail').toBeTruthy();
  await signOut(page);

  await page.goto(link!);
  await page.getByLabel('Your name').fill('Visiting QA');
  await page.getByLabel('Password', { exact: true }).fill('a-long-buyer-password');
  await page.getByLabel('Repeat password').fill('a-long-buyer-password');
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByTestId('form-success')).toContainText('is ready');

  // The link is single use.
  await page.goto(link!);
  await expect(page.getByTestId('invitation-problem')).toContainText('already been used');
  // A tampered link gets a clear page, not a crash.
  await page.goto(link!.slice(0, -3) + 'xyz');
  await expect(page.getByTestId('invitation-problem')).toContainText('not valid');

  await signIn(page, buyerEmail, 'a-long-buyer-password');
  await expect(page.getByTestId('area-nav').getByRole('link')).toHaveText(['Atlas', 'Properties']);
});
