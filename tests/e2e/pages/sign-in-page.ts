import { expect, type Page } from '@playwright/test';

/** The sign-in page as a user works it. */
export class SignInPage {
  constructor(readonly page: Page) {}

  async goto(query = '') {
    return this.page.goto(`/sign-in${query}`);
  }

  async submit(email: string, password: string) {
    await this.page.getByLabel('E-mail').fill(email);
    await this.page.getByLabel('Password').fill(password);
    await this.page.getByRole('button', { name: 'Sign in' }).click();
  }

  /** Sign in and wait for the app shell. */
  async signIn(email: string, password: string) {
    await this.goto();
    await this.submit(email, password);
    await expect(this.page.getByTestId('area-nav')).toBeVisible();
  }

  error() {
    return this.page.getByTestId('form-error');
  }
}
