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
