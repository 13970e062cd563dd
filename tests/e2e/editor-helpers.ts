import { expect, type Page } from '@playwright/test';
import { expectNoSidewaysScroll } from './invitation-helpers';

export const EDITOR2 = 'editor2@kestrelvale.example';
export const SLUG = 'apple-jonathan';

/** Same-site headers for a write through page.request (the page's cookies go along). */
export const sameSite = (page: Page) => ({ origin: new URL(page.url()).origin });

/** Start a draft of the cultivar through the JSON API as the signed-in editor; its id. */
export async function draftByApi(page: Page, slug = SLUG): Promise<number> {
  const response = await page.request.post(`/api/cultivars/${slug}/revisions`, {
    data: {},
    headers: sameSite(page),
  });
  expect(response.status(), await response.text()).toBe(201);
  return (await response.json()).revision.id;
}

/** Submit a draft (its copied values) for review through the JSON API. */
export async function submitByApi(page: Page, id: number) {
  const response = await page.request.post(`/api/revisions/${id}/submit`, {
    data: {},
    headers: sameSite(page),
  });
  expect(response.status(), await response.text()).toBe(200);
}

export async function publishByApi(page: Page, id: number) {
  const response = await page.request.post(`/api/revisions/${id}/publish`, {
    data: {},
    headers: sameSite(page),
  });
  expect(response.status(), await response.text()).toBe(200);
}

/**
 * Full-page screenshots at desktop (1280) and phone (390) width, checking first that nothing
 * sticks out sideways at either; the viewport goes back to desktop afterwards.
 */
export async function shootBoth(page: Page, name: string) {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await expectNoSidewaysScroll(page, width);
    await page.screenshot({ path: `tests/artifacts/editor-${name}-${width}.png`, fullPage: true });
  }
  await page.setViewportSize({ width: 1280, height: 900 });
}
