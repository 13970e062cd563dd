import fs from 'node:fs';
import { expect, test } from './fixtures';

test('an engineer saves a drop check, opens its report and downloads the PDF', async ({
  page,
  signInAs,
}) => {
  await signInAs('engineer');
  await page.goto('/checks/drop');
  await page.getByLabel('Cultivar').selectOption('');
  for (const [label, value] of [
    ["Young's modulus", '3'],
    ["Poisson's ratio", '0.35'],
    ['Diameter', '80'],
    ['Mass', '200'],
    ['Static bruise threshold', '100'],
    ['Drop height', '120'],
  ]) {
    await page.getByLabel(label).fill(value);
  }
  await expect(page.getByTestId('drop-figures')).toBeVisible();
  const save = page.getByTestId('save-assessment');
  await save.getByLabel('Title').fill('Chute into the hopper');
  await save.getByLabel('Notes').fill('Steel chute, line 3');
  // A save that never gets an answer (network down) says so and leaves the button usable; it
  // used to stay on "Saving…" for good.
  await page.route('**/api/assessments', (route) => route.abort('internetdisconnected'));
  await save.getByRole('button', { name: 'Save assessment' }).click();
  await expect(save).toContainText('could not be reached');
  await expect(save.getByRole('button', { name: 'Save assessment' })).toBeEnabled();
  await page.unroute('**/api/assessments');
  await save.getByRole('button', { name: 'Save assessment' }).click();
  await save.getByRole('link', { name: 'Saved: open the report' }).click();

  const report = page.getByTestId('assessment-report');
  await expect(report.getByRole('heading', { name: 'Chute into the hopper' })).toBeVisible();
  await expect(page.getByTestId('pinned-data')).toContainText('values entered by hand');
  await expect(page.getByTestId('margin-panel')).toContainText('bruise risk');
  await page.screenshot({ path: 'tests/artifacts/assessment-report.png', fullPage: true });

  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download PDF' }).click();
  const file = await (await download).path();
  const bytes = fs.readFileSync(file);
  expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
  fs.copyFileSync(file, 'tests/artifacts/assessment-report.pdf');

  await page.goto('/assessments');
  await expect(page.getByTestId('assessments-list')).toContainText('Chute into the hopper');
});
