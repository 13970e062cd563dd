import { expect, test } from '@playwright/test';
import { ACCOUNTS, signIn, signOut } from './helpers';

// Navigation each role should see, from the capability table in lib/auth/roles.ts.
const NAV: Record<keyof typeof ACCOUNTS, string[]> = {
  admin: ['Atlas', 'Properties', 'Checks', 'Assessments', 'Editor', 'Admin'],
  editor: ['Atlas', 'Properties', 'Checks', 'Assessments', 'Editor'],
  engineer: ['Atlas', 'Properties', 'Checks', 'Assessments'],
  buyer: ['Atlas', 'Properties'],
};

test('a signed-out visitor is sent to sign-in', async ({ page }) => {
  await page.goto('/admin/users');
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
  await page.screenshot({ path: 'tests/artifacts/sign-in.png' });
});

test('a wrong password gets a clear message', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(ACCOUNTS.engineer);
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('form-error')).toContainText('do not match an active account');
});

for (const role of Object.keys(NAV) as (keyof typeof ACCOUNTS)[]) {
  test(`${role} signs in, sees exactly their areas, and signs out`, async ({ page }) => {
    await signIn(page, ACCOUNTS[role]);
    const links = page.getByTestId('area-nav').getByRole('link');
    await expect(links).toHaveText(NAV[role]);
    await expect(page.getByTestId('standing-caution')).toContainText(
      'not a substitute for bruise tests',
    );
    if (role === 'engineer') {
      await page.screenshot({ path: 'tests/artifacts/home-engineer.png', fullPage: true });
    }
    if (role === 'admin') {
      await page.screenshot({ path: 'tests/artifacts/home-admin.png', fullPage: true });
    }
    await signOut(page);
    await page.goto('/');
    await expect(page).toHaveURL(/\/sign-in/);
  });
}

test('a buyer opening /admin/users sees the 403 page', async ({ page }) => {
  await signIn(page, ACCOUNTS.buyer);
  const response = await page.goto('/admin/users');
  expect(response?.status()).toBe(403);
  await expect(page.getByTestId('forbidden-page')).toContainText('Not open to your role');
  await page.screenshot({ path: 'tests/artifacts/forbidden-buyer.png' });
});

test('an unknown address shows the not-found page', async ({ page }) => {
  await signIn(page, ACCOUNTS.engineer);
  const response = await page.goto('/no-such-area');
  expect(response?.status()).toBe(404);
  await expect(page.getByRole('heading', { name: 'No page here' })).toBeVisible();
});

test('repeated failed sign-ins are refused with a clear message', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('someone.guessing@elsewhere.example');
  for (let i = 0; i < 5; i++) {
    await page.getByLabel('Password').fill(`guess-${i}`);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByTestId('form-error')).toContainText('do not match');
  }
  await page.getByLabel('Password').fill('guess-6');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('form-error')).toContainText('Too many failed sign-ins');
});
