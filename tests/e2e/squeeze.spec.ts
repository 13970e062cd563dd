import fs from 'node:fs';
import { expect, test } from './fixtures';

test('an engineer squeezes a seeded cultivar, changes the pad, saves, reports and downloads the PDF', async ({
  page,
  signInAs,
}) => {
  test.setTimeout(120_000);
  await signInAs('engineer');
  await page.goto('/checks/squeeze?cultivar=apple-jonathan');
  // Jonathan has a published flesh modulus; the figures its sources do not give are typed in.
  for (const [label, value] of [
    ["Poisson's ratio", '0.35'],
    ['Diameter (equatorial)', '70'],
    ['Mass', '150'],
    ['Static bruise threshold', '100'],
    ['Friction coefficient', '0.5'],
  ]) {
    await page.getByLabel(label, { exact: true }).fill(value);
  }
  const margin = page.getByTestId('margin-value');
  await expect(margin).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('chart-squeeze-sweep')).toBeVisible();
  await expect(page.getByTestId('slip-map')).toContainText('the grip holds');
  const before = await margin.innerText();
  await page.getByLabel('Pad diameter', { exact: true }).fill('6');
  await expect(margin).not.toHaveText(before, { timeout: 30_000 });
  await page.screenshot({ path: 'tests/artifacts/check-squeeze.png', fullPage: true });

  await page.getByRole('button', { name: 'Estimate the probability of bruising' }).click();
  await expect(page.getByTestId('probability-result')).toContainText('P(margin < 1)', {
    timeout: 60_000,
  });

  const save = page.getByTestId('save-assessment');
  await save.getByLabel('Title').fill('Robot cell pads, Jonathan');
  await save.getByRole('button', { name: 'Save assessment' }).click();
  await save.getByRole('link', { name: 'Saved: open the report' }).click();
  await expect(page.getByTestId('pinned-data')).toContainText('Jonathan');
  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download PDF' }).click();
  const bytes = fs.readFileSync(await (await download).path());
  expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
  await page.screenshot({ path: 'tests/artifacts/assessment-squeeze.png', fullPage: true });
});

test('with only the machine typed, a cultivar runs on the knowledge base and every figure says where it came from', async ({
  page,
  signInAs,
}) => {
  test.setTimeout(90_000);
  await signInAs('engineer');
  await page.goto('/checks/squeeze?cultivar=apple-jonathan');
  // Nothing of the fruit is typed: the placeholders name the rung each figure comes from.
  await expect(page.getByLabel("Young's modulus", { exact: true })).toHaveAttribute(
    'placeholder',
    /\(own\)$/,
  );
  await expect(page.getByLabel("Poisson's ratio", { exact: true })).toHaveAttribute(
    'placeholder',
    /\((own|commodity|derived|typical)\)$/,
  );
  await expect(page.getByTestId('margin-value')).toBeVisible({ timeout: 30_000 });
  const used = page.getByTestId('used-values');
  await expect(used).toContainText("this cultivar's published value");
  await expect(used).toContainText("the commodity's published value");
  await expect(page.getByTestId('rests-on')).toContainText('The verdict rests on');
  // A stage with no values of its own: the page says which stage the figures were measured at.
  await page.getByTestId('stage-select').selectOption('ripe');
  await expect(page.getByTestId('margin-value')).toBeVisible({ timeout: 30_000 });
  await page.setViewportSize({ width: 390, height: 900 });
  await page.screenshot({ path: 'tests/artifacts/check-squeeze-evidence-390.png', fullPage: true });
});
