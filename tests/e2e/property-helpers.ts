import { expect, type APIResponse, type Browser, type Locator, type Page } from '@playwright/test';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { SignInPage } from './pages/sign-in-page';
import { expectNoSidewaysScroll } from './invitation-helpers';

export const JONATHAN = 'apple-jonathan';

/** Same-site headers for a write through page.request (the page's cookies go along). */
export const ownOrigin = (page: Page) => ({ origin: new URL(page.url()).origin });

/** A second signed-in browser, for the other editor of a publish. */
export async function signedInPage(browser: Browser, email: string, baseURL: string) {
  const context = await browser.newContext({ baseURL });
  const page = await context.newPage();
  await new SignInPage(page).signIn(email, DEMO_PASSWORD);
  return { page, close: () => context.close() };
}

/**
 * Open a page and wait until React has hydrated the element with this test id (hydrated DOM
 * nodes carry React's own `__reactProps$…` key), so a click or focus reaches its handler.
 */
export async function gotoHydrated(page: Page, url: string | 'reload', testId: string) {
  if (url === 'reload') await page.reload();
  else await page.goto(url);
  await page.waitForFunction((id) => {
    const el = document.querySelector(`[data-testid="${id}"]`);
    return Boolean(el && Object.keys(el).some((k) => k.startsWith('__reactProps$')));
  }, testId);
}

/** The rows of the properties table as shown, top to bottom. */
export const tableRows = (page: Page) => page.getByTestId('property-row');

/** The visible text of one column in every shown row (the cell's first value, or ''). */
export async function columnTexts(page: Page, column: string): Promise<string[]> {
  return tableRows(page)
    .locator(`td[data-column="${column}"]`)
    .evaluateAll((cells) =>
      cells.map((c) => (c.querySelector('button') as HTMLElement | null)?.innerText ?? ''),
    );
}

/** The leading number of a shown value ("2.52 MPa (2.36–3.28)" → 2.52), NaN for none. */
export const leadingNumber = (text: string) => (text ? Number(text.split(' ')[0]) : NaN);

export async function slugsShown(page: Page): Promise<string[]> {
  return tableRows(page).evaluateAll((rows) => rows.map((r) => r.getAttribute('data-slug') ?? ''));
}

/** RFC 4180 rows of a CSV text (CRLF), quotes removed; a leading byte-order mark dropped. */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  const body = text.replace(/^\uFEFF/, '');
  for (let i = 0; i < body.length; i++) {
    const ch = body[i];
    if (quoted && ch === '"' && body[i + 1] === '"') {
      cell += '"';
      i++;
    } else if (ch === '"') {
      quoted = !quoted;
    } else if (!quoted && ch === ',') {
      row.push(cell);
      cell = '';
    } else if (!quoted && ch === '\r' && body[i + 1] === '\n') {
      rows.push([...row, cell]);
      row = [];
      cell = '';
      i++;
    } else {
      cell += ch;
    }
  }
  if (cell || row.length) rows.push([...row, cell]);
  return rows;
}

/** Full-page screenshots at 1280 and 390 px, each first checked for sideways overflow. */
export async function shootBoth(page: Page, name: string, keep?: Locator) {
  for (const width of [1280, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await expectNoSidewaysScroll(page, width);
    if (keep) await expect(keep).toBeVisible();
    await page.screenshot({
      path: `tests/artifacts/properties-${name}-${width}.png`,
      fullPage: true,
    });
  }
  await page.setViewportSize({ width: 1280, height: 900 });
}

type ApiValue = Record<string, unknown> & {
  quantity: string;
  variant: string;
  value: number;
  spread: { low: number | null; high: number | null };
  source: { key: string } | null;
};
const isFlesh = (v: ApiValue) => v.quantity === 'youngs_modulus' && v.variant === 'flesh';

/** A revision's value as the draft API takes it back (source by key). */
const asInput = (v: ApiValue) => ({
  ...Object.fromEntries(
    ['quantity', 'variant', 'value', 'low', 'high', 'sd', 'samples', 'method', 'ripeness']
      .concat(['temperature', 'storage', 'loadingRate', 'probe', 'note', 'isTypicalDefault'])
      .map((k) => [k, v[k]]),
  ),
  sourceKey: v.source?.key ?? null,
});

async function expectStatus(response: Promise<APIResponse>, status: number) {
  const r = await response;
  expect(r.status(), await r.text()).toBe(status);
  return r.json();
}

/**
 * Publish a new revision of Jonathan with another flesh modulus through the JSON API: the
 * editor drafts, edits and submits it; editor2 publishes it. Returns the published record
 * before, and the new revision.
 */
export async function publishFleshModulus(browser: Browser, baseURL: string, value: number) {
  const editor = await signedInPage(browser, ACCOUNTS.editor, baseURL);
  const req = editor.page.request;
  const headers = ownOrigin(editor.page);
  const { cultivar } = await expectStatus(req.get(`/api/cultivars/${JONATHAN}`), 200);
  const created = await expectStatus(
    req.post(`/api/cultivars/${JONATHAN}/revisions`, { data: {}, headers }),
    201,
  );
  const id = created.revision.id as number;
  const { revision } = await expectStatus(req.get(`/api/revisions/${id}`), 200);
  const values = (revision.values as ApiValue[]).map((v) =>
    isFlesh(v) ? { ...asInput(v), value } : asInput(v),
  );
  const data = { summary: `Flesh modulus re-read: ${value} MPa`, values };
  await expectStatus(req.put(`/api/revisions/${id}`, { data, headers }), 200);
  await expectStatus(req.post(`/api/revisions/${id}/submit`, { data: {}, headers }), 200);
  await editor.close();
  const editor2 = await signedInPage(browser, 'editor2@kestrelvale.example', baseURL);
  await expectStatus(
    editor2.page.request.post(`/api/revisions/${id}/publish`, {
      data: {},
      headers: ownOrigin(editor2.page),
    }),
    200,
  );
  await editor2.close();
  return {
    before: {
      revisionNumber: cultivar.revision.number as number,
      flesh: (cultivar.values as ApiValue[]).find(isFlesh)!,
    },
    revision: revision as { number: number },
  };
}
