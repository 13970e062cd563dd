import { expect, type Page } from '@playwright/test';

// Demo accounts from seeds/01_users.ts (demo only).
export const PASSWORD = 'kestrel-demo-2026';
export const ACCOUNTS = {
  admin: 'admin@kestrelvale.example',
  editor: 'editor@kestrelvale.example',
  engineer: 'engineer@kestrelvale.example',
  buyer: 'buyer@kestrelvale.example',
} as const;

export async function signIn(page: Page, email: string, password = PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByTestId('area-nav')).toBeVisible();
}

export async function signOut(page: Page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
}
