import { DEMO_PASSWORD, expect, test } from './fixtures';
import {
  draftByApi,
  EDITOR2,
  publishByApi,
  sameSite,
  shootBoth,
  SLUG,
  submitByApi,
} from './editor-helpers';

test.use({ viewport: { width: 1280, height: 900 } });

test('draft → field error → save → submit; another editor publishes; page, API and follower see it', async ({
  page,
  signInAs,
  signInPage,
  shell,
}) => {
  // An engineer follows the cultivar first, so the publish e-mails them.
  await signInAs('engineer');
  const follow = await page.request.put(`/api/cultivars/${SLUG}/follow`, {
    data: { follow: true },
    headers: sameSite(page),
  });
  expect(follow.status(), await follow.text()).toBe(200);
  await shell.signOut();

  await signInAs('editor');
  await page.goto('/editor');
  await expect(page.getByRole('link', { name: 'Lab tests' })).toHaveAttribute(
    'href',
    '/editor/lab-tests',
  );
  await page.getByTestId('start-draft-form').getByLabel('Cultivar').selectOption(SLUG);
  await page.getByRole('button', { name: 'Start a draft' }).click();
  await expect(page).toHaveURL(/\/editor\/revisions\/\d+$/);
  const id = Number(page.url().split('/').pop());

  const row = page.getByTestId('value-row').filter({ hasText: "Young's modulus (flesh)" });
  const value = row.getByLabel('Value (MPa)');
  await expect(value).toHaveValue('2.52'); // the seeded published value, copied into the draft
  // A decimal comma is read ("2,71" is 2.71); a value in words is not.
  await value.fill('two point seven');
  await page.getByLabel('What this revision changes').fill('Flesh modulus re-read: 2.71 MPa');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(row.getByText('The value must be a number.')).toBeVisible();
  await expect(value).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByTestId('error-summary')).toContainText(
    /Value \d+, value: The value must be a number\./,
  );
  await expect(value).toHaveValue('two point seven'); // what was typed is kept
  await expect(page.getByLabel('What this revision changes')).toHaveValue(
    'Flesh modulus re-read: 2.71 MPa',
  );
  await shootBoth(page, 'draft-field-error');

  await value.fill('2,71');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByTestId('form-success')).toHaveText('Draft saved.');
  await page.getByRole('button', { name: 'Save and submit for review' }).click();
  await expect(page.getByTestId('waiting-note')).toContainText('waiting for another editor');
  await expect(page.getByRole('button', { name: 'Publish' })).toHaveCount(0);
  await page.goto('/editor');
  await expect(page.getByTestId('my-revisions-row').filter({ hasText: 'In review' })).toContainText(
    'waiting for another editor',
  );
  await shootBoth(page, 'home');
  await shell.signOut();

  await signInPage.signIn(EDITOR2, DEMO_PASSWORD);
  await page.goto('/editor');
  const queued = page.getByTestId('review-queue-row').filter({ hasText: 'Jonathan' });
  await expect(queued).toContainText('Tomas Reyn');
  await queued.getByRole('link').click();
  await expect(page).toHaveURL(new RegExp(`/editor/revisions/${id}$`));
  const changed = page.getByTestId('diff-row').filter({ hasText: "Young's modulus (flesh)" });
  await expect(changed).toHaveAttribute('data-change', 'changed');
  await expect(changed).toContainText('2.52 MPa (2.36–3.28)');
  await expect(changed).toContainText('2.71 MPa (2.36–3.28)');
  await shootBoth(page, 'review');
  await page.getByRole('button', { name: 'Publish' }).click();
  await expect(page.getByTestId('revision-meta').getByTestId('revision-status')).toHaveText(
    'Published',
  );

  // The published record now carries the new value.
  const api = await page.request.get(`/api/cultivars/${SLUG}`);
  const { cultivar } = await api.json();
  const flesh = cultivar.values.find(
    (v: { quantity: string; variant: string }) =>
      v.quantity === 'youngs_modulus' && v.variant === 'flesh',
  );
  expect(flesh).toMatchObject({ value: 2.71, unit: 'MPa' });
  expect(cultivar.revision.id).toBe(id);
  const cultivarPage = await page.goto(`/properties/${SLUG}`);
  expect(cultivarPage?.status()).toBe(200);
  await expect(page.getByText('2.71 MPa').first()).toBeVisible();
  await shell.signOut();

  // The follower's e-mail, as the admin's outbox shows it.
  await signInAs('admin');
  await page.goto('/admin/outbox');
  const mail = page
    .getByTestId('outbox-message')
    .filter({ hasText: 'engineer@kestrelvale.example' })
    .filter({ hasText: 'Jonathan' })
    .first();
  await expect(mail).toContainText("Young's modulus (flesh): 2.52 MPa (2.36–3.28) → 2.71 MPa");
});

test('a returned revision shows the reviewer’s comment to its author', async ({
  page,
  signInAs,
  signInPage,
  shell,
}) => {
  await signInAs('editor');
  await page.goto('/editor');
  const id = await draftByApi(page);
  await submitByApi(page, id);
  await shell.signOut();

  await signInPage.signIn(EDITOR2, DEMO_PASSWORD);
  await page.goto(`/editor/revisions/${id}`);
  await page.getByRole('button', { name: 'Return with comment' }).click();
  await expect(page.locator('#comment-error')).toContainText('Say what should change');
  await page
    .getByLabel('What should change (required)')
    .fill('Name the storage date of the range.');
  await page.getByRole('button', { name: 'Return with comment' }).click();
  await expect(page.getByTestId('revision-meta').getByTestId('revision-status')).toHaveText(
    'Returned',
  );
  await shell.signOut();

  await signInAs('editor');
  await page.goto('/editor');
  const mine = page.getByTestId('my-revisions-row').filter({ hasText: 'Returned' });
  await expect(mine.getByTestId('review-comment')).toContainText(
    'Name the storage date of the range.',
  );
  await mine.getByRole('link').first().click();
  await expect(page.getByTestId('review-comment')).toContainText(
    'Name the storage date of the range.',
  );
  await expect(page.getByTestId('draft-form')).toBeVisible();
});

test('publishing over a newer revision shows the 409 plainly; the author rebases', async ({
  page,
  signInAs,
  signInPage,
  shell,
}) => {
  await signInAs('editor');
  await page.goto('/editor');
  const first = await draftByApi(page);
  const second = await draftByApi(page);
  await submitByApi(page, first);
  await submitByApi(page, second);
  await shell.signOut();

  await signInPage.signIn(EDITOR2, DEMO_PASSWORD);
  await page.goto('/editor');
  await publishByApi(page, first);
  await page.goto(`/editor/revisions/${second}`);
  await expect(page.getByTestId('stale-notice')).toContainText('is newer');
  await page.getByRole('button', { name: 'Publish' }).click();
  await expect(page.getByTestId('review-panel').getByTestId('form-error')).toContainText(
    'has been published since',
  );
  await shell.signOut();

  await signInAs('editor');
  await page.goto(`/editor/revisions/${second}`);
  await page.getByRole('button', { name: /^Rebase on revision \d+$/ }).click();
  await expect(page.getByTestId('stale-notice')).toHaveCount(0);
  await expect(page.getByTestId('draft-form')).toBeVisible();
});

test('a buyer opening /editor gets the 403 page', async ({ page, signInAs }) => {
  await signInAs('buyer');
  const response = await page.goto('/editor');
  expect(response?.status()).toBe(403);
  await expect(page.getByTestId('forbidden-page')).toBeVisible();
  const revision = await page.goto('/editor/revisions/1');
  expect(revision?.status()).toBe(403);
});
