import fs from 'node:fs/promises';
import { expect, test } from './fixtures';
import {
  columnTexts,
  gotoHydrated,
  JONATHAN,
  leadingNumber,
  parseCsv,
  shootBoth,
  publishFleshModulus,
  slugsShown,
  tableRows,
} from './property-helpers';

test.use({ viewport: { width: 1280, height: 900 } });

/** True when the numbers rise (or fall) from one to the next; blanks must all come last. */
function ordered(texts: string[], direction: 1 | -1): boolean {
  const firstBlank = texts.findIndex((t) => t === '');
  const filled = firstBlank === -1 ? texts : texts.slice(0, firstBlank);
  if (firstBlank !== -1 && texts.slice(firstBlank).some((t) => t !== '')) return false;
  const n = filled.map(leadingNumber);
  return n.every((x, i) => i === 0 || direction * (x - n[i - 1]) >= 0);
}

test('the table sorts, filters by commodity, text and range, pages and chooses columns', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await gotoHydrated(page, '/properties?size=100', 'properties-table');
  const total = await tableRows(page).count();
  expect(total).toBeGreaterThanOrEqual(3);

  await page.getByTestId('sort-failure_stress').click();
  await expect(page).toHaveURL(/sort=failure_stress/);
  expect(ordered(await columnTexts(page, 'failure_stress'), 1)).toBe(true);
  await page.getByTestId('sort-failure_stress').click();
  await expect(page).toHaveURL(/sort=-failure_stress/);
  expect(ordered(await columnTexts(page, 'failure_stress'), -1)).toBe(true);
  // The view survives a reload: it lives in the address.
  await gotoHydrated(page, 'reload', 'properties-table');
  await expect(page.getByRole('columnheader', { name: /Tissue failure stress/ })).toHaveAttribute(
    'aria-sort',
    'descending',
  );

  await page.getByLabel('Commodity', { exact: true }).selectOption({ label: 'Apple' });
  await expect(page).toHaveURL(/commodity=apple/);
  const commodities = await tableRows(page).locator('td[data-column="commodity"]').allInnerTexts();
  expect(new Set(commodities)).toEqual(new Set(['Apple']));
  expect(await slugsShown(page)).toContain(JONATHAN);

  // Into a cultivar and Back again: the view is as it was left.
  await page.getByRole('link', { name: 'Jonathan', exact: true }).click();
  await expect(page).toHaveURL(new RegExp(`/properties/${JONATHAN}$`));
  await page.goBack();
  await expect(page.getByLabel('Commodity', { exact: true })).toHaveValue('apple');

  await page.getByLabel('Cultivar or commodity').fill('jonath');
  await expect(tableRows(page)).toHaveCount(1);
  await page.getByLabel('Cultivar or commodity').fill('');

  // Jonathan's failure stress, 252 kPa (Shahabasi 1979), lies inside 240–260 kPa.
  await page.getByLabel('Range on').selectOption('failure_stress');
  await page.getByLabel('At least (kPa)').fill('240');
  await page.getByLabel('At most (kPa)').fill('260');
  await expect(page).toHaveURL(/range=failure_stress&min=240&max=260/);
  for (const text of await columnTexts(page, 'failure_stress')) {
    const x = leadingNumber(text);
    expect(x >= 240 && x <= 260, text).toBe(true);
  }
  expect(await slugsShown(page)).toContain(JONATHAN);
  await page.getByLabel('At least (kPa)').fill('300');
  await expect(page.locator('#filter-range-problem')).toContainText('minimum is above');
  await expect(page.getByLabel('At least (kPa)')).toHaveAttribute('aria-invalid', 'true');
  await page.getByLabel('Range on').selectOption('');

  await page.getByText(/^Columns/).click();
  await page.getByRole('checkbox', { name: /Poisson's ratio/ }).uncheck();
  await page.getByRole('checkbox', { name: /Bulk density/ }).check();
  await expect(page.getByRole('columnheader', { name: /Poisson's ratio/ })).toHaveCount(0);
  await expect(page.getByRole('columnheader', { name: /Bulk density/ })).toBeVisible();
  await expect(page).toHaveURL(/cols=[a-z_,]*bulk_density/);

  await gotoHydrated(page, '/properties?size=2', 'properties-table');
  await expect(tableRows(page)).toHaveCount(2);
  const first = await slugsShown(page);
  await expect(page.getByTestId('page-status')).toContainText(`Page 1 of ${Math.ceil(total / 2)}`);
  await page.getByRole('button', { name: 'Next page' }).click();
  await expect(page.getByTestId('page-status')).toContainText('Page 2 of');
  await expect(page).toHaveURL(/page=2/);
  const second = await slugsShown(page);
  expect(second.some((s) => first.includes(s))).toBe(false);
  await gotoHydrated(page, 'reload', 'properties-table');
  expect(await slugsShown(page)).toEqual(second);
  await page.getByRole('button', { name: 'Previous page' }).click();
  expect(await slugsShown(page)).toEqual(first);
  await page.goto('/properties');
  await shootBoth(page, 'table', page.getByTestId('properties-table'));
});

test('the CSV export holds the current view: its rows, order and columns', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  // Apples, failure stress high to low, two quantities shown. First the whole view on one
  // page, then the same view two rows a page: the export holds every match (not only the page
  // shown), in the shown order, with the shown columns.
  const view =
    '/properties?commodity=apple&sort=-failure_stress&cols=youngs_modulus,failure_stress';
  await page.goto(`${view}&size=100`);
  const shown = await tableRows(page).locator('td[data-column="name"]').allInnerTexts();
  const stress = await columnTexts(page, 'failure_stress');
  expect(shown.length).toBeGreaterThan(0);
  await gotoHydrated(page, `${view}&size=2`, 'properties-table');
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: 'Export this view as CSV' }).click(),
  ]);
  const [header, ...rows] = parseCsv(await fs.readFile((await download.path())!, 'utf8'));
  expect(header.slice(0, 5)).toEqual([
    'commodity',
    'cultivar',
    'slug',
    'revision',
    'youngs_modulus_mpa',
  ]);
  expect(header).toContain('failure_stress_kpa');
  expect(header).not.toContain('density_kg_m3');
  expect(rows).toHaveLength(shown.length);
  expect(rows.map((r) => r[header.indexOf('cultivar')])).toEqual(shown);
  expect(new Set(rows.map((r) => r[0]))).toEqual(new Set(['Apple']));
  // Each exported number is the leading number of the cell shown (same figure, no rounding).
  expect(rows.map((r) => Number(r[header.indexOf('failure_stress_kpa')] || NaN))).toEqual(
    stress.map(leadingNumber),
  );
  const jonathan = rows.find((r) => r[header.indexOf('slug')] === JONATHAN)!;
  // Shahabasi, Y. (1979), thesis abstract: 252 kPa at failure on 15 November, as seeded.
  expect(jonathan[header.indexOf('failure_stress_kpa')]).toBe('252');
  expect(jonathan[header.indexOf('failure_stress_source')]).toBe('Shahabasi, Y. 1979');
});

test('hovering or focusing a value shows its source and conditions', async ({ page, signInAs }) => {
  await signInAs('engineer');
  await gotoHydrated(page, '/properties?q=jonathan', 'properties-table');
  const cell = tableRows(page).first().locator('td[data-column="failure_stress"]');
  const value = cell.getByRole('button').first();
  await expect(value).toHaveText('252 kPa (235–444)');
  const tooltip = page.getByRole('tooltip');
  await expect(tooltip).toHaveCount(0);
  await value.hover();
  await expect(tooltip).toBeVisible();
  await expect(tooltip).toContainText('Shahabasi, Y. (1979)');
  await expect(tooltip).toContainText('Method: Flesh cylinders in compression');
  await page.screenshot({ path: 'tests/artifacts/properties-tooltip-1280.png' });
  await page.mouse.move(0, 0);
  await expect(tooltip).toHaveCount(0);

  await value.focus();
  await expect(tooltip).toBeVisible();
  await expect(value).toHaveAccessibleDescription(/Shahabasi, Y\. \(1979\).*Michigan State/);
  await page.keyboard.press('Escape');
  await expect(tooltip).toHaveCount(0);
  // A quantity with no value says so in words (a dash to the eye).
  await page.goto('/properties?q=jonathan&cols=lateral_pressure_ratio');
  const none = tableRows(page).first().locator('td[data-column="lateral_pressure_ratio"]');
  await expect(none).toHaveText('—no published value');
  await expect(none.getByText('no published value')).toHaveClass(/sr-only/);
});

test('the cultivar page shows every value with its conditions and full source', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto(`/properties/${JONATHAN}`);
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Jonathan');
  await expect(page.getByTestId('cultivar-commodity')).toContainText('Apple');
  const stress = page.getByTestId('quantity-failure_stress').getByTestId('value-card').first();
  await expect(stress).toContainText('252 kPa (235–444)');
  await expect(stress).toContainText('Flesh cylinders in compression');
  await expect(stress).toContainText('Bulk storage');
  const citation = stress.getByTestId('source-citation');
  await expect(citation).toContainText('Shahabasi, Y. (1979)');
  await expect(citation).toContainText('maximum allowable depth of apples in a bulk storage');
  await expect(citation).toContainText('PhD thesis, Michigan State University');
  await expect(citation).toContainText('How it was read: Read in the abstract');
  await expect(page.getByTestId('quantity-youngs_modulus')).toContainText('flesh');
  await expect(page.getByTestId('quantity-lateral_pressure_ratio')).toContainText(
    'no published value',
  );
  await expect(page.getByTestId('cultivar-caution')).toContainText(
    'not a substitute for bruise tests',
  );
  await expect(page.getByTestId('revision-history')).toBeVisible();
  await shootBoth(page, 'cultivar', page.getByTestId('revision-history'));
});

test('an unknown or malformed cultivar address is a 404 page', async ({ page, signInAs }) => {
  await signInAs('engineer');
  for (const path of ['/properties/no-such-cultivar', '/properties/Bad_Slug!']) {
    const response = await page.goto(path);
    expect(response?.status(), path).toBe(404);
    await expect(page.getByRole('heading', { name: 'No page here' })).toBeVisible();
  }
  expect((await page.goto('/properties/no-such-cultivar/compare'))?.status()).toBe(404);
});

test('follow toggles, and the state is kept on the server', async ({ page, signInAs }) => {
  await signInAs('engineer');
  await gotoHydrated(page, `/properties/${JONATHAN}`, 'follow');
  const area = page.getByTestId('follow');
  const button = area.getByRole('button');
  // Whatever an earlier spec left, bring it to "not following" first.
  if ((await button.getAttribute('aria-pressed')) === 'true') {
    await button.click();
    await expect(button).toHaveAttribute('aria-pressed', 'false');
  }
  await expect(button).toHaveText('Follow');
  await button.click();
  await expect(button).toHaveText('Unfollow');
  await expect(button).toHaveAttribute('aria-pressed', 'true');
  await expect(area).toContainText('You are following');
  await gotoHydrated(page, 'reload', 'follow');
  await expect(page.getByTestId('follow').getByRole('button')).toHaveText('Unfollow');
  await page.getByTestId('follow').getByRole('button').click();
  await expect(page.getByTestId('follow').getByRole('button')).toHaveText('Follow');
  await expect(page.getByTestId('follow')).toContainText('Not following');
});

test('an editor starts a draft from the cultivar page and lands in the editor', async ({
  page,
  signInAs,
}) => {
  await signInAs('editor');
  await gotoHydrated(page, `/properties/${JONATHAN}`, 'follow');
  await page.getByRole('button', { name: 'Start a draft' }).click();
  await expect(page).toHaveURL(/\/editor\/revisions\/\d+$/);
});

test('a buyer sees values and sources, and no history, diff, follow or draft controls', async ({
  page,
  signInAs,
}) => {
  await signInAs('buyer');
  await gotoHydrated(page, '/properties?q=jonathan', 'properties-table');
  const value = tableRows(page).first().locator('td[data-column="failure_stress"] button');
  await value.focus();
  await expect(page.getByRole('tooltip')).toContainText('Shahabasi, Y. (1979)');

  await page.goto(`/properties/${JONATHAN}`);
  await expect(page.getByTestId('source-citation').first()).toContainText('Shahabasi');
  await expect(page.getByTestId('quantity-failure_stress')).toContainText('252 kPa');
  const html = await page.content();
  for (const hidden of ['revision-history', 'compare-form', 'data-testid="follow"']) {
    expect(html, hidden).not.toContain(hidden);
  }
  await expect(page.getByRole('button', { name: /Follow|Start a draft/ })).toHaveCount(0);
  await expect(page.getByRole('heading', { name: 'Revision history' })).toHaveCount(0);
  expect((await page.goto(`/properties/${JONATHAN}/compare?from=1&to=1`))?.status()).toBe(403);
});

test('an engineer compares two revisions: the changed value shows old → new with sources', async ({
  page,
  signInAs,
  browser,
  baseURL,
}) => {
  // Editor drafts and submits a new flesh modulus; editor2 publishes it (nobody their own).
  const { before, revision } = await publishFleshModulus(browser, baseURL!, 3.05);
  const flesh = before.flesh;

  await signInAs('engineer');
  await page.goto(`/properties/${JONATHAN}`);
  const form = page.getByTestId('compare-form');
  await form.getByLabel('Older (before)').selectOption(String(before.revisionNumber));
  await form.getByLabel('Newer (after)').selectOption(String(revision.number));
  await form.getByRole('button', { name: 'Compare revisions' }).click();
  await expect(page).toHaveURL(
    new RegExp(`/compare\\?from=${before.revisionNumber}&to=${revision.number}$`),
  );
  const changed = page.locator('[data-testid="diff-row"][data-change="changed"]', {
    hasText: "Young's modulus (flesh)",
  });
  const spread = `(${flesh.spread.low}–${flesh.spread.high})`;
  await expect(changed.locator('del')).toHaveText(`${flesh.value} MPa ${spread}`);
  await expect(changed.locator('ins')).toHaveText(`3.05 MPa ${spread}`);
  await expect(changed).toContainText('Shahabasi, Y. 1979');
  expect(await changed.evaluate((el) => getComputedStyle(el).backgroundColor)).not.toBe(
    'rgba(0, 0, 0, 0)',
  );
  await page.getByText(/^Show the \d+ unchanged value/).click();
  await expect(
    page.locator('[data-testid="diff-row"][data-change="same"]', { hasText: 'failure stress' }),
  ).toBeVisible();
  await shootBoth(page, 'diff', page.getByTestId('revision-diff'));

  await page.goto(`/properties/${JONATHAN}/compare?from=abc&to=999999`);
  await expect(page.getByTestId('compare-problem')).toContainText(
    '“abc” is not a revision number.',
  );
  await expect(page.getByTestId('compare-problem')).toContainText(
    'no revision 999999 of this cultivar',
  );
});
