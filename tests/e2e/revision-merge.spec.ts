import type { Page } from '@playwright/test';
import { DEMO_PASSWORD, expect, test } from './fixtures';
import { EDITOR2, publishByApi, sameSite, shootBoth, submitByApi } from './editor-helpers';

test.use({ viewport: { width: 1280, height: 900 } });

const WILLIAMS = 'pear-williams';

interface ApiValue {
  quantity: string;
  variant: string;
  value: number;
  low: number | null;
  high: number | null;
  sd: number | null;
  samples: number | null;
  method: string | null;
  ripeness: string | null;
  temperature: string | null;
  storage: string | null;
  loadingRate: string | null;
  probe: string | null;
  note: string | null;
  stage: string | null;
  observation: string | null;
  isTypicalDefault: boolean;
  typicalBasis: string | null;
  source: { key: string } | null;
}

/** A revision's values as the PUT body takes them back. */
async function valuesOf(page: Page, id: number) {
  const response = await page.request.get(`/api/revisions/${id}`);
  expect(response.status()).toBe(200);
  const values: ApiValue[] = (await response.json()).revision.values;
  return values.map(({ source, ...v }) => ({ ...v, sourceKey: source?.key ?? null }));
}

/** Replace the draft's static bruise threshold (or add one) through the JSON API. */
async function setThreshold(page: Page, id: number, kPa: number) {
  const kept = (await valuesOf(page, id)).filter((v) => v.quantity !== 'static_bruise_threshold');
  const threshold = {
    quantity: 'static_bruise_threshold',
    variant: '',
    value: kPa,
    sourceKey: 'tjaf-pear-apple-storage',
    method: 'Flat plate held on whole fruit',
  };
  const response = await page.request.put(`/api/revisions/${id}`, {
    data: { values: [...kept, threshold] },
    headers: sameSite(page),
  });
  expect(response.status(), await response.text()).toBe(200);
}

/** The id of the seeded demo revision 2 of Williams (editor2's, in review). */
async function demoRevisionId(page: Page): Promise<number> {
  const response = await page.request.get(`/api/cultivars/${WILLIAMS}/revisions`);
  const { revisions } = await response.json();
  return revisions.find((r: { number: number }) => r.number === 2).id;
}

test('the Williams case: rebasing revision 2 onto 3 keeps the new 120 kPa; a conflict is decided before submitting', async ({
  page,
  signInAs,
  signInPage,
  shell,
}) => {
  // Tomas starts revision 3 of Williams while Ilse's revision 2 is in review: he is told.
  await signInAs('editor');
  await page.goto('/editor');
  await page.getByTestId('start-draft-form').getByLabel('Cultivar').selectOption(WILLIAMS);
  await page.getByRole('button', { name: 'Start a draft' }).click();
  await expect(page).toHaveURL(/\/editor\/revisions\/\d+$/);
  const three = Number(page.url().split('/').pop());
  await expect(page.getByTestId('open-revisions-notice')).toContainText(
    'revision 2 (in review, Ilse Brandt)',
  );

  // The draft as typed, against the newest published revision, before saving.
  const live = page.getByTestId('live-diff');
  await expect(live).toContainText('No value differs from revision 1');
  // The first row is the published apparent modulus at harvest (1.68 MPa).
  const modulus = page
    .getByTestId('value-row')
    .first()
    .getByLabel(/^Value/);
  const typed = await modulus.inputValue();
  await modulus.fill(String(Number(typed) + 0.1));
  await expect(
    live.getByTestId('diff-row').filter({ hasText: "Young's modulus (apparent)" }),
  ).toHaveAttribute('data-change', 'changed');
  await modulus.fill(typed);
  await expect(live).toContainText('No value differs from revision 1');

  // A source not in the list yet is added from the draft page and can be chosen at once.
  const addSource = page.getByTestId('add-source');
  await addSource.getByText('A source that is not in the list? Add it').click();
  await addSource.getByLabel('Kind of work').selectOption('report');
  await addSource.getByLabel('Key').fill('Bad Key');
  await addSource.getByLabel('Title').fill('Williams plate trials of the 2026 intake');
  await addSource.getByRole('button', { name: 'Add the source' }).click();
  await expect(addSource.getByText('Use lower-case letters, digits and dashes')).toBeVisible();
  await expect(addSource.getByLabel('Title')).toHaveValue(
    'Williams plate trials of the 2026 intake',
  );
  await addSource.getByLabel('Key').fill('kv-williams-plates-2026');
  await addSource.getByRole('button', { name: 'Add the source' }).click();
  await expect(addSource.getByTestId('form-success')).toContainText('kv-williams-plates-2026');
  await expect(
    page.getByTestId('value-row').first().getByLabel('Source').locator('option', {
      hasText: 'kv-williams-plates-2026',
    }),
  ).toHaveCount(1);

  await setThreshold(page, three, 120);
  await submitByApi(page, three);
  await shell.signOut();

  // Ilse publishes revision 3, then rebases her revision 2 on it: 120 kPa is carried in.
  await signInPage.signIn(EDITOR2, DEMO_PASSWORD);
  await page.goto('/editor');
  await publishByApi(page, three);
  const two = await demoRevisionId(page);
  await page.goto(`/editor/revisions/${two}`);
  await expect(page.getByTestId('stale-notice')).toContainText('revision 3 is newer');
  await page.getByRole('button', { name: 'Rebase on revision 3' }).click();
  await expect(page.getByTestId('stale-notice')).toHaveCount(0);
  // The form now holds the carried-in threshold, so a save cannot drop it again.
  await expect(
    page
      .getByTestId('value-row')
      .filter({ has: page.locator('option:checked', { hasText: 'Static bruise threshold' }) }),
  ).toHaveCount(1);
  // Against revision 3: the threshold is the same, the demo's own modulus still differs.
  const against3 = page.getByTestId('live-diff').getByTestId('diff-row');
  await expect(against3.filter({ hasText: 'Static bruise threshold' })).toHaveAttribute(
    'data-change',
    'same',
  );
  await expect(against3.filter({ hasText: "Young's modulus (apparent)" })).toHaveAttribute(
    'data-change',
    'changed',
  );
  const values = await valuesOf(page, two);
  expect(
    values.filter((v) => v.quantity === 'static_bruise_threshold').map((v) => v.value),
  ).toEqual([120]);
  expect(values.some((v) => v.quantity === 'youngs_modulus' && v.value === 1.42)).toBe(true);

  // Ilse changes the threshold to 110 while Tomas's 130 is published: a conflict.
  await setThreshold(page, two, 110);
  await shell.signOut();
  await signInAs('editor');
  await page.goto('/editor');
  const four = (
    await (
      await page.request.post(`/api/cultivars/${WILLIAMS}/revisions`, {
        data: {},
        headers: sameSite(page),
      })
    ).json()
  ).revision.id;
  await setThreshold(page, four, 130);
  await submitByApi(page, four);
  await shell.signOut();
  await signInAs('admin');
  await page.goto('/editor');
  await publishByApi(page, four);
  await shell.signOut();

  await signInPage.signIn(EDITOR2, DEMO_PASSWORD);
  await page.goto(`/editor/revisions/${two}`);
  await page.getByRole('button', { name: /^Rebase on revision \d+$/ }).click();
  const conflict = page.getByTestId('conflict');
  await expect(conflict).toHaveCount(1);
  await expect(conflict).toContainText('Static bruise threshold');
  await expect(conflict).toContainText('120 kPa');
  await expect(conflict).toContainText('110 kPa');
  await expect(conflict).toContainText('130 kPa');
  await shootBoth(page, 'rebase-conflict');

  // Submitting is refused until it is decided.
  await page.getByRole('button', { name: 'Save and submit for review' }).click();
  await expect(page.getByTestId('draft-form').getByTestId('form-error')).toContainText(
    'Decide the conflict',
  );
  const refused = await page.request.post(`/api/revisions/${two}/submit`, {
    data: {},
    headers: sameSite(page),
  });
  expect(refused.status()).toBe(400);

  await conflict.getByRole('button', { name: 'Take theirs' }).click();
  await expect(page.getByTestId('conflict')).toHaveCount(0);
  await page.getByRole('button', { name: 'Save and submit for review' }).click();
  await expect(page.getByTestId('waiting-note')).toBeVisible();
  await shell.signOut();

  // The reviewers were e-mailed on each submit.
  await signInAs('admin');
  await page.goto('/admin/outbox');
  await expect(
    page
      .getByTestId('outbox-message')
      .filter({ hasText: 'For review: Pear, Williams, revision 3' })
      .first(),
  ).toContainText('Static bruise threshold');
});

test('an unknown revision answers 404', async ({ page, signInAs }) => {
  await signInAs('editor');
  const response = await page.goto('/editor/revisions/999999');
  expect(response?.status()).toBe(404);
  expect((await page.goto('/editor/revisions/not-a-number'))?.status()).toBe(404);
});

test('the account page mutes and unmutes workflow e-mails; engineers do not see the switch', async ({
  page,
  signInAs,
  shell,
}) => {
  await signInAs('editor');
  await page.goto('/account');
  const form = page.getByTestId('workflow-mail-form');
  await expect(form.getByLabel('E-mail me')).toBeChecked();
  await form.getByLabel('Mute these e-mails').check();
  await form.getByRole('button', { name: 'Save e-mail choice' }).click();
  await expect(form.getByTestId('form-success')).toContainText('muted');
  await page.reload();
  await expect(
    page.getByTestId('workflow-mail-form').getByLabel('Mute these e-mails'),
  ).toBeChecked();
  await page.getByTestId('workflow-mail-form').getByLabel('E-mail me').check();
  await page
    .getByTestId('workflow-mail-form')
    .getByRole('button', { name: 'Save e-mail choice' })
    .click();
  await expect(page.getByTestId('workflow-mail-form').getByTestId('form-success')).toContainText(
    'You will be e-mailed',
  );
  await shell.signOut();

  await signInAs('engineer');
  await page.goto('/account');
  await expect(page.getByTestId('workflow-mail-form')).toHaveCount(0);
});

test('the compare pickers start from the revision before the newest', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto('/properties/apple-jonathan');
  const form = page.getByTestId('compare-form');
  const numbers = (
    await form
      .getByLabel('Newer (after)')
      .locator('option')
      .evaluateAll((os) => os.map((o) => Number((o as HTMLOptionElement).value)))
  ).sort((a, b) => b - a);
  test.skip(numbers.length < 3, 'needs three visible revisions of Jonathan');
  await expect(form.getByLabel('Newer (after)')).toHaveValue(String(numbers[0]));
  await expect(form.getByLabel('Older (before)')).toHaveValue(String(numbers[1]));
  // With only "after" in the address, the base is the revision just before it.
  await page.goto(`/properties/apple-jonathan/compare?to=${numbers[1]}`);
  await expect(page.getByLabel('Older (before)')).toHaveValue(String(numbers[2]));
});
