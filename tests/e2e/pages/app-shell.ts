import { expect, type Page } from '@playwright/test';

/** The header every signed-in page shares: areas, account link, sign-out. */
export class AppShell {
  constructor(readonly page: Page) {}

  areaLinks() {
    return this.page.getByTestId('area-nav').getByRole('link');
  }

  accountLink() {
    return this.page.getByTestId('account-link');
  }

  async signOut() {
    await this.page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await expect(this.page).toHaveURL(/\/sign-in/);
  }
}
