import type { Locator, Page } from '@playwright/test';
import sharp from 'sharp';
import { expect, test } from './fixtures';
import { expectNoSidewaysScroll, expectWithinWidth } from './invitation-helpers';

const SLUG = 'apple-jonathan';
const shot = (name: string) => `tests/artifacts/photos-${name}.png`;

/** A small orchard-green JPEG made here, with a stripe so the variant visibly is the upload. */
async function testJpeg(): Promise<Buffer> {
  const stripe = await sharp({
    create: { width: 900, height: 120, channels: 3, background: '#f2d23c' },
  })
    .png()
    .toBuffer();
  return sharp({ create: { width: 900, height: 600, channels: 3, background: '#3e6b2f' } })
    .composite([{ input: stripe, top: 240, left: 0 }])
    .jpeg()
    .toBuffer();
}

/** The image has been fetched and decoded (not a broken-image icon). */
async function expectLoaded(image: Locator) {
  await expect
    .poll(() => image.evaluate((el: HTMLImageElement) => (el.complete ? el.naturalWidth : 0)))
    .toBeGreaterThan(0);
}

async function openUploadForm(page: Page) {
  await page.goto(`/properties/${SLUG}`);
  await page.getByTestId('cultivar-photos').getByText('Add a photo').click();
  return page.getByTestId('photo-upload-form');
}

test.describe('cultivar photos', () => {
  test('an editor uploads a photo on the cultivar page and it appears', async ({
    page,
    signInAs,
  }) => {
    await page.setViewportSize({ width: 1280, height: 900 });
    await signInAs('editor');
    const form = await openUploadForm(page);
    const caption = `Jonathan in a field bin, picked ${Date.now()}`;
    await form.getByLabel('Photo file').setInputFiles({
      name: 'field-bin.jpg',
      mimeType: 'image/jpeg',
      buffer: await testJpeg(),
    });
    await form.getByLabel('Caption').fill(caption);
    await form.getByLabel('Credit').fill('Kestrel Vale packhouse lab');
    await form.getByRole('button', { name: 'Upload photo' }).click();
    await expect(form.getByTestId('form-success')).toHaveText('Photo added.');

    const figure = page.getByTestId('photo').filter({ hasText: caption });
    await expect(figure).toBeVisible();
    await expect(figure).toContainText('Credit: Kestrel Vale packhouse lab');
    await expect(figure).not.toContainText('demo photo');
    await expectLoaded(figure.getByRole('img', { name: caption }));
    await expect(form.getByLabel('Caption')).toHaveValue('');
    await page.getByTestId('cultivar-photos').screenshot({ path: shot('editor-1280') });
  });

  test('a renamed text file is refused beside the file field', async ({ page, signInAs }) => {
    await signInAs('editor');
    const form = await openUploadForm(page);
    const file = form.getByLabel('Photo file');
    await file.setInputFiles({
      name: 'notes.jpg',
      mimeType: 'image/jpeg',
      buffer: Buffer.from('Bin 12: Jonathan, bruising on the shoulder\n'),
    });
    await form.getByRole('button', { name: 'Upload photo' }).click();
    await expect(form.locator('#photo-file-error')).toHaveText(
      /not a JPEG, PNG or WebP image: its contents are not an image/,
    );
    await expect(file).toHaveAttribute('aria-invalid', 'true');
    await expect(file).toHaveAttribute('aria-describedby', /photo-file-error/);
    await form.screenshot({ path: shot('refused-1280') });
    // Through the app's own HTTP server: a 9 MB photo is refused by its declared length.
    const tooLarge = await page.request.post(`/api/cultivars/${SLUG}/photos`, {
      multipart: {
        file: { name: 'big.jpg', mimeType: 'image/jpeg', buffer: Buffer.alloc(9 * 1024 * 1024) },
      },
    });
    expect(tooLarge.status()).toBe(413);
    expect((await tooLarge.json()).message).toMatch(/larger than 8256 KB/);
  });

  test('a buyer sees the photos but no upload form, and the route refuses them', async ({
    page,
    signInAs,
  }) => {
    await signInAs('buyer');
    await page.goto(`/properties/${SLUG}`);
    const photos = page.getByTestId('cultivar-photos');
    await expect(photos.getByText('demo photo').first()).toBeVisible();
    await expect(photos.getByText('Demo image, drawn for the demonstration').first()).toBeVisible();
    await expectLoaded(photos.getByRole('img').first());
    await expect(page.getByTestId('photo-upload-form')).toHaveCount(0);
    await expect(photos.getByText('Add a photo')).toHaveCount(0);
    const refused = await page.request.post(`/api/cultivars/${SLUG}/photos`, {
      multipart: {
        file: { name: 'x.jpg', mimeType: 'image/jpeg', buffer: await testJpeg() },
      },
    });
    expect(refused.status()).toBe(403);
  });

  test('on a 390 px phone the photos and the form fit the width', async ({ page, signInAs }) => {
    await page.setViewportSize({ width: 390, height: 844 });
    await signInAs('editor');
    const form = await openUploadForm(page);
    await expectWithinWidth(page, page.getByTestId('photo').first());
    await expectWithinWidth(page, form.getByRole('button', { name: 'Upload photo' }));
    await expectNoSidewaysScroll(page);
    await page.screenshot({ path: shot('editor-390'), fullPage: true });
    await page.getByTestId('cultivar-photos').screenshot({ path: shot('section-390') });
  });
});
