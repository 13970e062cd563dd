import fs from 'node:fs';
import { expect, test } from './fixtures';
import { expectNoSidewaysScroll, pdfStrings, watchCsp } from './atlas-helpers';

const shot = (name: string) => `tests/artifacts/atlas-${name}.png`;

test('a buyer searches by keyboard, reads the apple article with live values and takes its sheet', async ({
  page,
  signInAs,
}) => {
  const violations = await watchCsp(page);
  await signInAs('buyer');

  // "/" from anywhere puts the cursor in the header's search box; the misspelling still finds it.
  // The shortcut listens once the page has hydrated: press again until it has (a press before
  // that does nothing, and the box stays empty).
  const box = page.getByRole('combobox', { name: 'Search the Atlas and the property data' });
  await expect(async () => {
    await page.keyboard.press('/');
    await expect(box).toBeFocused({ timeout: 500 });
  }).toPass({ timeout: 10_000 });
  await expect(box).toHaveValue('');
  await page.keyboard.type('bin tiping');
  const listbox = page.getByRole('listbox', { name: 'Search results' });
  await expect(listbox.getByRole('group', { name: 'Article sections' })).toBeVisible();
  await expect(listbox.locator('mark').first()).toBeVisible();
  await page.screenshot({ path: shot('search') });
  await page.keyboard.press('ArrowDown');
  const first = listbox.getByRole('option').first();
  await expect(first).toHaveAttribute('aria-selected', 'true');
  await expect(box).toHaveAttribute('aria-activedescendant', (await first.getAttribute('id'))!);
  await page.keyboard.press('Enter');
  await expect(page).toHaveURL(/\/atlas\/apple#receiving-and-bin-tipping$/);

  // The article: formulas typeset by KaTeX with its own fonts, the live Jonathan card.
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Apple');
  const card = page.getByTestId('live-values-apple-jonathan');
  await expect(card).toContainText('2.52 MPa (2.36–3.28)');
  await expect(card).toContainText('no published value');
  await expect(page.locator('.katex-display').first()).toBeVisible();
  // The stylesheet's @font-face rules must be there and their files loaded under font-src 'self'.
  const katexFont = await page.evaluate(async () => {
    await document.fonts.ready;
    const loaded = [...document.fonts].filter((f) => f.status === 'loaded');
    return ['KaTeX_Main', 'KaTeX_Math'].every((family) =>
      loaded.some((f) => f.family.replace(/["']/g, '') === family),
    );
  });
  expect(katexFont, 'KaTeX fonts loaded').toBe(true);
  await expect(page.locator('#source-shahabasi-1979')).toContainText('Shahabasi');
  await page.screenshot({ path: shot('apple-article'), fullPage: true });

  // The handling sheet on paper: no header or navigation, the rules and values on A4.
  await page.getByRole('link', { name: 'Handling sheet', exact: true }).first().click();
  await expect(page).toHaveURL(/\/atlas\/apple\/sheet$/);
  const sheet = page.getByTestId('handling-sheet');
  await expect(sheet).toContainText('Receiving and bin tipping');
  await expect(sheet).toContainText('2.52 MPa (2.36–3.28)');
  // A4 at 96 px per inch is 794 px wide; the print margins come off that on paper.
  await page.setViewportSize({ width: 794, height: 1123 });
  await page.emulateMedia({ media: 'print' });
  await expect(page.getByTestId('area-nav')).toBeHidden();
  await expect(page.getByRole('button', { name: 'Print' })).toBeHidden();
  await expect(page.getByTestId('standing-caution')).toBeHidden();
  await page.screenshot({ path: shot('sheet-print'), fullPage: true });
  await page.emulateMedia({ media: 'screen' });
  await page.setViewportSize({ width: 1280, height: 800 });

  // The PDF, rendered on the server.
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByTestId('sheet-pdf-link').click(),
  ]);
  expect(download.suggestedFilename()).toBe('tenderline-apple-handling-sheet.pdf');
  const file = 'tests/artifacts/atlas-apple-handling-sheet.pdf';
  await download.saveAs(file);
  const pdf = fs.readFileSync(file);
  expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  // One or two A4 pages of text, two small embedded fonts: tens of kilobytes, not bytes or megabytes.
  expect(pdf.length).toBeGreaterThan(5_000);
  expect(pdf.length).toBeLessThan(500_000);
  const words = pdfStrings(pdf);
  expect(words).toContain('Handling rules along the line');
  expect(words).toContain('Receiving and bin tipping');
  const pages = pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? [];
  expect(pages.length).toBeGreaterThanOrEqual(1);
  expect(pages.length).toBeLessThanOrEqual(2);

  expect(await violations()).toEqual([]);
});

test('the PDF route answers as a download; an unknown commodity is a 404', async ({
  page,
  signInAs,
}) => {
  await signInAs('buyer');
  const res = await page.request.get('/api/atlas/kiwifruit/sheet.pdf');
  expect(res.status()).toBe(200);
  expect(res.headers()['content-type']).toBe('application/pdf');
  expect(res.headers()['content-disposition']).toMatch(/^attachment; filename=/);
  expect((await page.goto('/atlas/no-such-fruit'))?.status()).toBe(404);
  expect((await page.request.get('/api/atlas/no-such-fruit/sheet.pdf')).status()).toBe(404);
});

test('the Atlas index lists every commodity by family, article or not', async ({
  page,
  signInAs,
}) => {
  await signInAs('buyer');
  await page.goto('/atlas');
  await expect(page.getByRole('heading', { name: 'Pome fruit' })).toBeVisible();
  const apple = page.getByTestId('atlas-card-apple');
  await expect(apple).toContainText('Most bruise-prone stage: Receiving and bin tipping');
  // Every seeded commodity (17) has a card; each now has its article, so none is "in preparation".
  await expect(page.locator('[data-testid^="atlas-card-"]')).toHaveCount(17);
  await expect(page.getByText('Article in preparation.')).toHaveCount(0);
  // A photo where one exists (served by the photo route), else the drawn stand-in.
  const photo = apple.getByTestId('atlas-photo');
  if (await photo.count()) {
    await expect(photo).toHaveJSProperty('complete', true);
    expect(await photo.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
  } else {
    await expect(apple.getByRole('img', { name: 'No photo of Apple yet' })).toBeVisible();
  }
  await page.waitForFunction(() => [...document.images].every((img) => img.complete));
  await page.screenshot({ path: shot('index'), fullPage: true });
});

test.describe('on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test('index, article, sheet and search fit the width', async ({ page, signInAs }) => {
    await signInAs('buyer');
    for (const [name, url] of [
      ['phone-index', '/atlas'],
      ['phone-kiwifruit', '/atlas/kiwifruit'],
      ['phone-sheet', '/atlas/kiwifruit/sheet'],
      ['phone-apple-sheet', '/atlas/apple/sheet'],
      ['phone-apple', '/atlas/apple'],
    ]) {
      await page.goto(url);
      await expectNoSidewaysScroll(page);
      await page.screenshot({ path: shot(name), fullPage: true });
    }
    await page.getByTestId('site-search').fill('shahabasy');
    await expect(page.getByRole('option').first()).toContainText('Shahabasi, 1979');
    await expectNoSidewaysScroll(page);
    await page.screenshot({ path: shot('phone-search') });
    await page.keyboard.press('Escape');
    await expect(page.getByRole('listbox')).toBeHidden();
  });
});
