import { expect, type Page } from '@playwright/test';

/** Invite through the JSON API as the signed-in user (the page's cookies go along). */
export async function inviteByApi(page: Page, email: string, role = 'buyer') {
  const response = await page.request.post('/api/invitations', { data: { email, role } });
  expect(response.status(), await response.text()).toBe(201);
  return (await response.json()).invitation as { id: number; email: string };
}

/** The newest invitation link e-mailed to this address, read from the admin outbox API. */
export async function latestLinkTo(page: Page, email: string): Promise<string> {
  const response = await page.request.get('/api/admin/outbox');
  expect(response.status()).toBe(200);
  const { messages } = (await response.json()) as { messages: { to: string; text: string }[] };
  const message = messages.find((m) => m.to.includes(email));
  const link = message?.text.match(/https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/)?.[0];
  expect(link, `invitation link to ${email}`).toBeTruthy();
  return link!;
}

/**
 * The page is no wider than the viewport: nothing sticks out sideways on a phone. Polled, since
 * charts resize on the next resize-observer tick after the viewport changes.
 */
export async function expectNoSidewaysScroll(page: Page, width = 390) {
  await expect
    .poll(() => page.evaluate(() => document.documentElement.scrollWidth), {
      message: 'document scroll width',
    })
    .toBeLessThanOrEqual(width);
}

/** The element is shown and lies wholly inside the viewport's width. */
export async function expectWithinWidth(page: Page, locator: ReturnType<Page['locator']>) {
  await expect(locator).toBeVisible();
  const box = await locator.boundingBox();
  const width = page.viewportSize()?.width ?? 390;
  expect(box, 'bounding box').not.toBeNull();
  expect(box!.x).toBeGreaterThanOrEqual(0);
  expect(box!.x + box!.width).toBeLessThanOrEqual(width);
}
