import { inflateSync } from 'node:zlib';
import { expect, type Page } from '@playwright/test';

/**
 * Collects Content-Security-Policy violations reported in the page (styles, fonts, images,
 * scripts). Left out: zod 4's feature probe, a caught `Function("")` call that reports
 * `script-src eval` on any page whose client code uses zod, and loads nothing.
 */
export async function watchCsp(page: Page): Promise<() => Promise<string[]>> {
  const console: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy|Refused to/i.test(m.text())) console.push(m.text());
  });
  await page.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener('securitypolicyviolation', (e) =>
      w.__csp.push(`${e.violatedDirective} ${e.blockedURI}`),
    );
  });
  const probe = /script-src eval|'unsafe-eval'/;
  return async () =>
    [
      ...console,
      ...(await page.evaluate(() => (window as unknown as { __csp?: string[] }).__csp ?? [])),
    ].filter((v) => !probe.test(v));
}

export async function expectNoSidewaysScroll(page: Page) {
  const { scroll, width } = await page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    width: window.innerWidth,
  }));
  expect(scroll, 'document scroll width').toBeLessThanOrEqual(width);
}

/**
 * The text a PDF draws with the built-in fonts: react-pdf (pdfkit) writes it as hex strings of
 * Windows-1252 bytes in `[<…> n <…>] TJ` arrays inside compressed content streams.
 */
export function pdfStrings(pdf: Buffer): string {
  const out: string[] = [];
  for (const m of pdf.toString('latin1').matchAll(/stream\r?\n([\s\S]*?)\r?\nendstream/g)) {
    let body: string;
    try {
      body = inflateSync(Buffer.from(m[1], 'latin1')).toString('latin1');
    } catch {
      continue; // an image or font stream, not page content
    }
    for (const tj of body.matchAll(/\[([^\]]*)\]\s*TJ/g)) {
      const hex = [...tj[1].matchAll(/<([0-9a-fA-F]*)>/g)].map((h) => h[1]).join('');
      out.push(Buffer.from(hex, 'hex').toString('latin1'));
    }
  }
  return out.join(' ');
}
