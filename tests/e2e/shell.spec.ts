import { ACCOUNTS, expect, test } from './fixtures';

// Navigation each role should see, written out from the product's role table.
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

test('a wrong password gets a clear message', async ({ signInPage }) => {
  await signInPage.goto();
  await signInPage.submit(ACCOUNTS.engineer, 'not-the-password');
  await expect(signInPage.error()).toContainText('do not match an active account');
});

for (const role of Object.keys(NAV) as (keyof typeof ACCOUNTS)[]) {
  test(`${role} signs in, sees exactly their areas, and signs out`, async ({
    page,
    signInAs,
    shell,
  }) => {
    await signInAs(role);
    await expect(shell.areaLinks()).toHaveText(NAV[role]);
    await expect(page.getByTestId('standing-caution')).toContainText(
      'not a substitute for bruise tests',
    );
    if (role === 'engineer' || role === 'admin') {
      await page.screenshot({ path: `tests/artifacts/home-${role}.png`, fullPage: true });
    }
    await shell.signOut();
    await page.goto('/');
    await expect(page).toHaveURL(/\/sign-in/);
  });
}

test('a buyer opening /admin/users sees the 403 page', async ({ page, signInAs }) => {
  await signInAs('buyer');
  const response = await page.goto('/admin/users');
  expect(response?.status()).toBe(403);
  await expect(page.getByTestId('forbidden-page')).toContainText('Not open to your role');
  await page.screenshot({ path: 'tests/artifacts/forbidden-buyer.png' });
});

test('an unknown address shows the not-found page', async ({ page, signInAs }) => {
  await signInAs('engineer');
  const response = await page.goto('/no-such-area');
  expect(response?.status()).toBe(404);
  await expect(page.getByRole('heading', { name: 'No page here' })).toBeVisible();
});

test('repeated failed sign-ins are refused with a clear message', async ({ signInPage }) => {
  await signInPage.goto();
  for (let i = 0; i < 5; i++) {
    await signInPage.submit('someone.guessing@elsewhere.example', `guess-${i}`);
    await expect(signInPage.error()).toContainText('do not match');
  }
  await signInPage.submit('someone.guessing@elsewhere.example', 'guess-6');
  await expect(signInPage.error()).toContainText('Too many sign-in attempts');
});
