import { expectNoSidewaysScroll } from './invitation-helpers';
import { expect, test } from './fixtures';

const shot = (name: string) => `tests/artifacts/lab-tests-${name}.png`;

/**
 * A curve made in the test from the Hertz relation for a sphere between parallel plates
 * (K. L. Johnson, Contact Mechanics, 1985, ch. 4): F = (d^½/(3(1 − ν²))) E D^(3/2), with invented
 * E = 2.5 MPa, d = 70 mm, ν = 0.35, and a softer tail past the fitted range.
 */
function hertzCsv(): string {
  const k = (Math.sqrt(0.07) / (3 * (1 - 0.35 ** 2))) * 2.5e6;
  const rows = ['displacement (mm),force (N)'];
  for (let i = 0; i <= 150; i++) {
    const d = i * 0.04;
    const tail = d > 3.5 ? 1 - 0.08 * (d - 3.5) : 1;
    rows.push(`${d.toFixed(2)},${(k * (d / 1000) ** 1.5 * tail).toFixed(3)}`);
  }
  return rows.join('\n') + '\n';
}

const csv = (name: string, text: string) => ({
  name,
  mimeType: 'text/csv',
  buffer: Buffer.from(text),
});

test('an editor uploads a compression test, sees E, R² and the plot, and starts a draft', async ({
  page,
  signInAs,
}) => {
  await signInAs('editor');
  await page.goto('/editor/lab-tests');
  await page.getByLabel('Cultivar').selectOption('apple-jonathan');
  await page.getByLabel('Sample diameter (mm)').fill('70');
  await page.getByLabel("Poisson's ratio ν (–)").fill('0.35');

  // A bad file first: the message names the row beside the file field, and nothing is kept.
  const bad = hertzCsv().replace('\n0.20,', '\n0.20,abc');
  await page.getByLabel('Test file (CSV)').setInputFiles(csv('bad.csv', bad));
  await page.getByRole('button', { name: 'Upload and fit' }).click();
  await expect(page.locator('#file-error')).toHaveText(/^row 7: force is not a number \('abc/);
  await expect(page.getByLabel('Test file (CSV)')).toHaveAttribute('aria-invalid', 'true');
  await page.screenshot({ path: shot('upload-error-1280'), fullPage: true });

  await page.getByLabel('Test file (CSV)').setInputFiles(csv('jonathan-1.csv', hertzCsv()));
  await page.getByRole('button', { name: 'Upload and fit' }).click();
  await expect(page).toHaveURL(/\/editor\/lab-tests\/\d+$/);
  // The curve is exact Hertz inside the fitted range: E = 2.5 MPa, shown to 3 digits.
  await expect(page.getByTestId('fit-modulus')).toHaveText('2.5 MPa');
  await expect(page.getByTestId('fit-r-squared')).toHaveText(/^(0\.99\d\d|1\.0000)$/);
  await expect(page.getByTestId('fit-range')).toHaveText('0.04–3.48 mm');
  await expect(page.getByTestId('fit-points')).toHaveText('87');
  const chart = page.getByTestId('lab-test-chart');
  await expect(chart.getByRole('application')).toBeVisible();
  await expect(chart.getByText('Plate displacement (mm)')).toBeVisible();
  await expect(chart.getByText('Force (N)', { exact: true })).toBeVisible();
  await expect(chart.locator('.recharts-scatter-symbol')).toHaveCount(151);
  await page.screenshot({ path: shot('result-1280'), fullPage: true });

  await page.setViewportSize({ width: 390, height: 844 });
  await expect(chart.getByRole('application')).toBeVisible();
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('result-390'), fullPage: true });
  await page.setViewportSize({ width: 1280, height: 900 });

  await page.getByRole('button', { name: 'Start a draft from this result' }).click();
  await expect(page).toHaveURL(/\/editor\/revisions\/\d+$/);
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Jonathan — revision');
  const revisionId = page.url().split('/').at(-1);
  const { revision } = await (await page.request.get(`/api/revisions/${revisionId}`)).json();
  const apparent = revision.values.find(
    (v: { variant: string; method: string | null }) =>
      v.variant === 'apparent' && v.method === 'Parallel-plate compression, Hertz fit (ASAE S368)',
  );
  expect([apparent.value, apparent.source.kind]).toEqual([2.5, 'report']);

  // The list shows the test; on a phone the list and the form fit the width.
  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/editor/lab-tests');
  await expect(page.getByTestId('lab-test-list')).toContainText('E 2.5 MPa');
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: shot('list-390'), fullPage: true });
});
