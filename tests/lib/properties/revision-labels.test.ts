import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { CompareForm } from '@/components/properties/compare-form';
import type { RevisionSummary } from '@/lib/properties/records';
import { pairAround } from '@/lib/properties/revision-labels';

describe('which two revisions a comparison starts from', () => {
  it('the newest after, the one just before it as the base', () => {
    expect(pairAround([1, 2, 3])).toEqual({ from: 2, to: 3 });
    expect(pairAround([5, 3, 9, 4])).toEqual({ from: 5, to: 9 });
  });

  it('a chosen "after" takes the revision just older than it as the base', () => {
    expect(pairAround([1, 2, 3, 4, 5], { to: 3 })).toEqual({ from: 2, to: 3 });
    expect(pairAround([1, 2, 3, 4, 5], { to: 1 })).toEqual({ from: 1, to: 1 });
    expect(pairAround([1, 2, 3], { from: 1 })).toEqual({ from: 1, to: 3 });
  });

  it('one revision is compared with itself; none gives nothing', () => {
    expect(pairAround([7])).toEqual({ from: 7, to: 7 });
    expect(pairAround([])).toBeNull();
  });
});

const revision = (number: number): RevisionSummary => ({
  id: 100 + number,
  cultivarId: 1,
  number,
  status: number === 5 ? 'published' : 'superseded',
  authorId: 1,
  authorName: 'A',
  reviewerName: null,
  reviewComment: null,
  basedOnId: null,
  summary: null,
  isDemo: false,
  createdAt: '2026-12-01T00:00:00.000Z',
  submittedAt: null,
  reviewedAt: null,
  publishedAt: null,
  supersededAt: null,
});

/** The option the server marks selected in one picker. */
function selected(html: string, name: 'from' | 'to'): string | undefined {
  const select = html.match(new RegExp(`<select[^>]*name="${name}"[^>]*>(.*?)</select>`))?.[1];
  return select?.match(/<option value="(\d+)" selected="">/)?.[1];
}

describe('the compare form', () => {
  const revisions = [5, 4, 3, 2, 1].map(revision);
  const render = (props: { from?: number; to?: number }) =>
    renderToStaticMarkup(createElement(CompareForm, { slug: 'apple-x', revisions, ...props }));

  it('starts from the revision before the newest, not the newest on both sides', () => {
    const html = render({});
    expect([selected(html, 'from'), selected(html, 'to')]).toEqual(['4', '5']);
  });

  it('with only "after" chosen, the base is the revision just before it', () => {
    const html = render({ to: 3 });
    expect([selected(html, 'from'), selected(html, 'to')]).toEqual(['2', '3']);
  });

  it('shows revision numbers and states only, never internal ids', () => {
    expect(render({})).not.toMatch(/\b10[1-5]\b/);
  });
});
