import { expect, test } from './fixtures';

async function customFruit(page: import('@playwright/test').Page) {
  await page.getByLabel('Cultivar').selectOption('');
  await page.getByLabel("Young's modulus").fill('3');
  await page.getByLabel("Poisson's ratio").fill('0.35');
  await page.getByLabel('Diameter').fill('80');
  await page.getByLabel('Mass').fill('200');
  await page.getByLabel('Static bruise threshold').fill('100');
}

test('drop check: the margin follows the drop height, with figures in their units', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto('/checks/drop');
  await customFruit(page);
  await page.getByLabel('Drop height').fill('100');
  const figures = page.getByTestId('drop-figures');
  // Worked example (Johnson 1985 §11.4, computed): 0.2 kg, R 40 mm, 100 mm onto steel → 607 kPa,
  // given to three figures: within 0.5 %.
  await expect(figures).toContainText('Peak pressure');
  const peak = async () =>
    Number((await figures.innerText()).match(/Peak pressure\s*([\d.]+) kPa/)![1]);
  await expect.poll(async () => Math.abs((await peak()) - 607) / 607).toBeLessThan(0.005);
  const first = await page.getByTestId('margin-value').innerText();
  await page.getByLabel('Drop height').fill('400');
  await expect.poll(peak).toBeGreaterThan(700);
  await expect(page.getByTestId('margin-value')).not.toHaveText(first);
  await expect(page.getByTestId('safe-heights')).toContainText('Conveyor belt rubber');
  await page.screenshot({ path: 'tests/artifacts/check-drop.png', fullPage: true });
  await page.getByLabel('Drop height').fill('-3');
  await expect(page.getByText('Drop height must be above 0 mm.')).toBeVisible();
});

test('stack check: deepest safe fill and a chart of pressure with depth', async ({
  page,
  signInAs,
}) => {
  await signInAs('editor');
  await page.goto('/checks/stack');
  await customFruit(page);
  await expect(page.getByTestId('deepest-safe')).toContainText('mm');
  await expect(page.getByTestId('chart-stack-pressure')).toBeVisible();
  await page.setViewportSize({ width: 390, height: 844 });
  // Charts shrink on the next resize-observer tick: poll until the layout settles.
  await expect
    .poll(() => page.evaluate(() => document.documentElement.scrollWidth))
    .toBeLessThanOrEqual(390);
  await page.screenshot({ path: 'tests/artifacts/check-stack-phone.png', fullPage: true });
});

test('a buyer may not run checks', async ({ page, signInAs }) => {
  await signInAs('buyer');
  const response = await page.goto('/checks/drop');
  expect(response?.status()).toBe(403);
});

test('US customary units apply to what is typed and shown; SI stays stored', async ({
  page,
  signInAs,
}) => {
  await signInAs('admin');
  await page.goto('/account');
  const form = page.getByTestId('unit-system-form');
  await form.getByLabel(/US customary/).check();
  await form.getByRole('button', { name: 'Save units' }).click();
  await expect(form.getByTestId('form-success')).toContainText('US customary');
  try {
    await page.goto('/checks/drop');
    await page.getByLabel('Cultivar').selectOption('');
    // 3 MPa = 435.1 psi, 80 mm = 3.150 in, 200 g = 7.055 oz, 100 kPa = 14.50 psi; 100 mm = 3.937 in
    // (NIST SP 811, 2008, App. B). The same fruit and drop as the worked example above.
    await page.getByLabel("Young's modulus").fill('435.11');
    await page.getByLabel("Poisson's ratio").fill('0.35');
    await page.getByLabel('Diameter').fill('3.1496');
    await page.getByLabel('Mass').fill('7.0548');
    await page.getByLabel('Static bruise threshold').fill('14.504');
    await page.getByLabel('Drop height').fill('3.937');
    const figures = page.getByTestId('drop-figures');
    // 607 kPa = 88.0 psi; 158 N = 35.5 lbf. Typed values carry 5 figures: 0.5 % covers both.
    const peak = async () =>
      Number((await figures.innerText()).match(/Peak pressure\s*([\d.]+) psi/)?.[1]);
    await expect.poll(async () => Math.abs((await peak()) - 88.04) / 88.04).toBeLessThan(0.005);
    await expect(figures).toContainText('lbf');
    await page.screenshot({ path: 'tests/artifacts/check-drop-us-units.png', fullPage: true });
    // Stack chart: the "this fill" marker sits at the typed fill depth. The default 600 mm shows
    // as 24 in (23.62 rounded to a default's round figure); the depth axis runs to 1.5 × that or
    // more, so the marker lies at a third to two thirds of the plot's width. (It was converted
    // twice and sat at 1/25.4 of its place, by the left edge.)
    await page.goto('/checks/stack');
    await page.getByLabel('Cultivar').selectOption('');
    await page.getByLabel("Young's modulus").fill('435.11');
    await page.getByLabel("Poisson's ratio").fill('0.35');
    await page.getByLabel('Diameter').fill('3.1496');
    await page.getByLabel('Mass').fill('7.0548');
    await page.getByLabel('Static bruise threshold').fill('14.504');
    await expect(page.getByLabel('Fill depth')).toHaveValue('24');
    const chart = page.getByTestId('chart-stack-pressure');
    const marker = chart.locator('.marker-this-fill line, line.marker-this-fill').first();
    await expect(marker).toBeAttached();
    const grid = await chart.locator('.recharts-cartesian-grid').boundingBox();
    const line = await marker.boundingBox();
    const at = (line!.x - grid!.x) / grid!.width;
    expect(at).toBeGreaterThan(0.3);
    expect(at).toBeLessThan(0.7);
    // Published values follow too: Jonathan's flesh modulus (2.52 MPa, Shahabasi 1979, unless a
    // later revision changed it) reads in psi.
    await page.goto('/properties/apple-jonathan');
    await expect(page.getByText(/\d psi/).first()).toBeVisible();
  } finally {
    await page.goto('/account');
    await form.getByLabel(/SI \(mm/).check();
    await form.getByRole('button', { name: 'Save units' }).click();
    await expect(form.getByTestId('form-success')).toContainText('SI units');
  }
});

test('an apple bulk bin at 600 mm: the verdict judges the bruise against a published grade, the onset margin beside it', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto('/checks/stack?cultivar=apple-type');
  // The page's defaults are a 1200 × 1000 mm bin filled 600 mm deep; nothing of the fruit typed.
  await expect(page.getByTestId('bruise-verdict')).toHaveText(
    "bruise within the grade's tolerance",
    {
      timeout: 30_000,
    },
  );
  await expect(page.getByTestId('bruise-words')).toContainText('U.S. Extra Fancy');
  await expect(page.getByTestId('margin-value')).toBeVisible();
  // A stricter site or research rule is chosen from the list; the verdict names it.
  await page.getByTestId('grade-select').selectOption('critical-bruise-100mm2');
  await expect(page.getByTestId('bruise-words')).toContainText('100 mm²', { timeout: 30_000 });
  await page.setViewportSize({ width: 390, height: 900 });
  await page.screenshot({ path: 'tests/artifacts/check-stack-grade-390.png', fullPage: true });
});

test("an admin adds the site's own grade rule, and engineers may judge by it", async ({
  page,
  signInAs,
}) => {
  await signInAs('admin');
  await page.goto('/admin/grade-rules');
  await expect(page.getByTestId('grade-rules')).toContainText('U.S. Extra Fancy');
  const form = page.getByTestId('grade-rule-form');
  await form.getByLabel('Name').fill('Line 4 apples: 12 mm');
  await form.getByLabel('Commodity').selectOption('apple');
  await form.getByLabel(/Largest bruise tolerated/).fill('12');
  await form.getByRole('button', { name: 'Add rule' }).click();
  await expect(form.getByTestId('grade-rule-message')).toContainText('Saved');
  await expect(page.getByTestId('grade-rules')).toContainText('Line 4 apples: 12 mm');
  // A bad limit is a message beside its field, and nothing is added.
  await form.getByLabel('Name').fill('Bad rule');
  await form.getByLabel(/Largest bruise tolerated/).fill('-3');
  await form.getByRole('button', { name: 'Add rule' }).click();
  await expect(form).toContainText('must be above 0');
  await page.setViewportSize({ width: 390, height: 900 });
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  await page.screenshot({ path: 'tests/artifacts/admin-grade-rules-390.png', fullPage: true });
});

test('how far to trust the checks: every check against its published outcomes, at 1280 and 390 px', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto('/checks/drop');
  await page.getByRole('link', { name: 'How far to trust the checks' }).click();
  // The page runs every calibration case on the server (about twenty checks): allow for it.
  await expect(page.getByRole('heading', { name: 'How far to trust the checks' })).toBeVisible({
    timeout: 60_000,
  });
  // The counts are the table's own; the seeded record gives rows for all three checks.
  for (const check of ['squeeze', 'stack', 'drop'])
    await expect(page.getByTestId(`calibration-count-${check}`)).toContainText(
      /\d+ of \d+ published outcomes agree/,
    );
  // Disagreements stay in the table, in words.
  await expect(page.getByRole('cell', { name: /disagrees/ }).first()).toBeVisible();
  await expect(page.getByRole('cell', { name: /Wang, Wang & Wu 2024/ })).toBeVisible();
  await page.screenshot({ path: 'tests/artifacts/calibration-1280.png', fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await expect(page.getByTestId('calibration-count-drop')).toBeVisible();
  await page.screenshot({ path: 'tests/artifacts/calibration-390.png', fullPage: true });
});

test('a buyer is refused the calibration page', async ({ page, signInAs }) => {
  await signInAs('buyer');
  const answer = await page.goto('/checks/calibration');
  expect(answer?.status()).toBe(403);
});
