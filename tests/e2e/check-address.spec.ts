import { expect, test } from './fixtures';

test('a check keeps its inputs in the address: reload, reopen from a saved assessment, answer in view', async ({
  page,
  signInAs,
}) => {
  test.setTimeout(120_000);
  await signInAs('engineer');
  await page.goto('/checks/squeeze?cultivar=apple-type');
  await expect(page.getByTestId('margin-value')).toBeVisible({ timeout: 30_000 });
  await page.getByLabel('Pad diameter', { exact: true }).fill('25');
  await page.getByLabel('Hold time', { exact: true }).fill('');
  // The figures follow into the address (in SI), and an emptied field travels empty.
  await expect.poll(() => new URL(page.url()).searchParams.get('padDiameterMm')).toBe('25');
  await expect.poll(() => new URL(page.url()).searchParams.get('holdSeconds')).toBe('');
  await page.reload();
  await expect(page.getByLabel('Pad diameter', { exact: true })).toHaveValue('25');
  await expect(page.getByLabel('Hold time', { exact: true })).toHaveValue('');
  await expect(page.getByLabel('Cultivar')).toHaveValue('apple-type');

  // No travel typed: chosen from the fruit's size, said in the report.
  await expect(page.getByTestId('squeeze-advanced')).toBeVisible();
  const save = page.getByTestId('save-assessment');
  await save.getByLabel('Title').fill('Pad of 25 mm, apple record');
  await save.getByRole('button', { name: 'Save assessment' }).click();
  await save.getByRole('link', { name: 'Saved: open the report' }).click();
  await expect(page.getByTestId('report-scenario')).toContainText("5 % of the fruit's radius");
  await page.getByRole('link', { name: 'Open in the check' }).click();
  await expect(page).toHaveURL(/\/checks\/squeeze\?/);
  await expect(page.getByLabel('Pad diameter', { exact: true })).toHaveValue('25');

  // On a phone the answer stays in view while the pad is changed far down the form.
  await page.setViewportSize({ width: 390, height: 844 });
  const pad = page.getByLabel('Pad diameter', { exact: true });
  await pad.scrollIntoViewIfNeeded();
  await pad.fill('30');
  const bar = page.getByTestId('result-bar');
  await expect(bar).toContainText('Margin');
  const box = await bar.boundingBox();
  expect(box).not.toBeNull();
  expect(box!.y).toBeGreaterThanOrEqual(-1);
  expect(box!.y + box!.height).toBeLessThanOrEqual(844);
  await page.screenshot({ path: 'tests/artifacts/check-result-bar-390.png' });
});
