import { test as base } from '@playwright/test';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { AppShell } from './pages/app-shell';
import { SignInPage } from './pages/sign-in-page';

type Role = keyof typeof ACCOUNTS;

/** Page objects and a one-line sign-in for specs: `test('…', async ({ signInAs, shell }) => …)`. */
export const test = base.extend<{
  signInPage: SignInPage;
  shell: AppShell;
  signInAs: (role: Role) => Promise<void>;
}>({
  signInPage: async ({ page }, provide) => provide(new SignInPage(page)),
  shell: async ({ page }, provide) => provide(new AppShell(page)),
  signInAs: async ({ signInPage }, provide) =>
    provide((role) => signInPage.signIn(ACCOUNTS[role], DEMO_PASSWORD)),
});

export { expect } from '@playwright/test';
export { ACCOUNTS, DEMO_PASSWORD };
