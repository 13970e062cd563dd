import { expectNoSidewaysScroll } from './invitation-helpers';
import { expect, test } from './fixtures';

const SHOTS = process.env.SHOTS_DIR ?? 'tests/artifacts';
const HEADER =
  'quantity,variant,value,unit,low,high,sd,samples,method,ripeness,stage,observation,temperature,storage,loading_rate,probe,note,typical,typical_basis,source_key';
const csv = (name: string, rows: string[]) => ({
  name,
  mimeType: 'text/csv',
  buffer: Buffer.from([HEADER, ...rows].join('\n') + '\n'),
});
const modulus = (value: number, unit = 'MPa') =>
  `youngs_modulus,flesh,${value},${unit},,,,8,Flesh cylinders,,,,,,,,,no,,shahabasi-1979`;

async function shoot(page: import('@playwright/test').Page, name: string) {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await expectNoSidewaysScroll(page, width);
    await page.screenshot({ path: `${SHOTS}/${name}-${width}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1280, height: 900 });
}

test('an editor reads the data gaps, starts a draft from a cell and imports values into it', async ({
  page,
  signInAs,
}) => {
  await signInAs('editor');
  await page.goto('/editor');
  await page.getByRole('link', { name: 'Data gaps' }).click();
  await expect(page.getByRole('heading', { name: 'Data gaps', level: 1 })).toBeVisible();
  await expect(page.getByTestId('gap-summary')).toContainText('Squeeze check');
  await expect(page.getByTestId('most-wanted').locator('li').first()).toContainText('input');

  // Filters live in the address; the matrix shows rungs in words.
  await page.getByLabel('Commodity', { exact: true }).selectOption('apple');
  await page.getByLabel('Sort by', { exact: true }).selectOption('own');
  await page.getByRole('button', { name: 'Show' }).click();
  await expect(page).toHaveURL(/commodity=apple/);
  await expect(page).toHaveURL(/sort=own/);
  const row = page.getByTestId('gap-row-apple-braeburn');
  await expect(row).toBeVisible();
  await expect(page.getByTestId('gap-row-pear-type')).toHaveCount(0);
  await expect(row.locator('td[data-rung]').first()).toHaveText(
    /^(own|commodity|derived|derived \(own\)|typical|missing)$/,
  );

  // At phone width the page does not scroll sideways; the matrix scrolls inside its box.
  await page.setViewportSize({ width: 390, height: 900 });
  await expectNoSidewaysScroll(page, 390);
  const box = page.getByTestId('gap-matrix');
  expect(await box.evaluate((el) => el.scrollWidth > el.clientWidth)).toBe(true);
  await page.setViewportSize({ width: 1280, height: 900 });
  await page.goto('/editor/gaps');
  await shoot(page, 'gaps');

  // A cell starts a draft of its record and opens it.
  await page
    .getByTestId('gap-row-apple-braeburn')
    .getByRole('button', { name: /Braeburn, Young's modulus/ })
    .click();
  await expect(page).toHaveURL(/\/editor\/revisions\/\d+$/);
  const draftUrl = new URL(page.url()).pathname;

  // Back on the gaps page, the record's cells open that draft instead.
  await page.goto('/editor/gaps?commodity=apple');
  await expect(
    page.getByTestId('gap-row-apple-braeburn').getByRole('link', { name: /Braeburn, Mass/ }),
  ).toHaveAttribute('href', draftUrl);

  // Import: a file with a wrong unit is refused with its line; a good one is stored.
  await page.goto(draftUrl);
  const panel = page.getByTestId('import-panel');
  await expect(panel.getByTestId('import-columns')).toContainText('source_key');
  await panel
    .getByLabel('CSV file')
    .setInputFiles(csv('bad.csv', [modulus(2.71), modulus(2710, 'kPa')]));
  await panel.getByRole('button', { name: 'Import values' }).click();
  await expect(panel.getByTestId('import-errors')).toContainText(
    `line 3: unit "kPa" does not match Young's modulus: use MPa.`,
  );
  await shoot(page, 'import-errors');
  await panel.getByLabel('CSV file').setInputFiles(csv('good.csv', [modulus(2.71), modulus(2.72)]));
  await panel.getByRole('button', { name: 'Import values' }).click();
  await expect(panel.getByTestId('import-done')).toContainText('Imported 2 values');
  await expect(page.locator('input[value="2.72"]')).toHaveCount(1);

  // The template downloads as CSV.
  const template = await page.request.get('/api/revisions/import-template');
  expect(template.headers()['content-type']).toMatch(/^text\/csv/);
  expect((await template.text()).split('\r\n')[0]).toBe(HEADER);
});

test('engineers and buyers get the 403 page for the data gaps', async ({ page, signInAs }) => {
  await signInAs('engineer');
  const answer = await page.goto('/editor/gaps');
  expect(answer?.status()).toBe(403);
  await expect(page.getByTestId('gap-matrix')).toHaveCount(0);
});
