import { existsSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * An unknown revision must answer 404, not a not-found page with 200. Next fixes the status when
 * the first byte streams, and a loading boundary (loading.tsx) above the page streams its
 * skeleton before the page's lookup runs; so no folder on the page's path may hold one.
 */
describe('the revision page answers 404 for an unknown revision', () => {
  it('has no loading boundary between the app root and the page', () => {
    const segments = ['app', '(app)', 'editor', 'revisions', '[id]'];
    const root = path.resolve(import.meta.dirname, '../..');
    expect(existsSync(path.join(root, ...segments, 'page.tsx'))).toBe(true);
    const boundaries = segments
      .map((_, i) => path.join(...segments.slice(0, i + 1), 'loading.tsx'))
      .filter((file) => existsSync(path.join(root, file)));
    expect(boundaries).toEqual([]);
  });
});
