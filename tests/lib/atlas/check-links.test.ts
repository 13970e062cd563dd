import { beforeAll, describe, expect, it } from 'vitest';
import '../../support/session';
import { freshDatabase, userId } from '../../support/db';
import { ACCOUNTS } from '../../support/accounts';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { listAllArticles } from '@/lib/atlas/articles';
import { renderArticle } from '@/components/atlas/render-article';
import { renderHtml } from './render-html';

// The articles that name a check, and the checks each names, read off content/atlas by hand.
const CHECKS_NAMED: Record<string, string[]> = {
  apple: ['squeeze'],
  apricot: ['stack'],
  avocado: ['drop'],
  banana: ['squeeze'],
  mango: ['squeeze'],
  peach: ['drop', 'squeeze'],
  pear: ['squeeze', 'stack'],
  potato: ['drop', 'stack'],
  tomato: ['squeeze'],
};

const articles = listAllArticles();
const actors: Record<'buyer' | 'engineer' | 'editor', Actor> = {} as never;
beforeAll(async () => {
  await freshDatabase();
  for (const role of ['buyer', 'engineer', 'editor'] as const) {
    actors[role] = (await getActiveActor(await userId(ACCOUNTS[role])))!;
  }
});

async function html(role: keyof typeof actors, slug: string) {
  const article = articles.find((a) => a.slug === slug)!;
  // React marks the seams between text pieces with empty comments; they are not text.
  return (await renderHtml((await renderArticle(actors[role], article)).content)).replaceAll(
    '<!-- -->',
    '',
  );
}

const checkHrefs = (page: string) =>
  [...new Set([...page.matchAll(/href="\/checks\/([a-z]+)"/g)].map((m) => m[1]))].sort();

describe('Atlas articles and the checks', () => {
  describe.each(articles.map((a) => [a.slug] as const))('%s', (slug) => {
    it('gives a buyer no link to a check, nor a "Checks page" to go to', async () => {
      const page = await html('buyer', slug);
      expect(checkHrefs(page)).toEqual([]);
      expect(page).not.toMatch(/href="\/checks/);
      expect(page).not.toMatch(/Checks page/i);
    });

    it('links an engineer and an editor to each check it names', async () => {
      for (const role of ['engineer', 'editor'] as const) {
        expect(checkHrefs(await html(role, slug))).toEqual(CHECKS_NAMED[slug] ?? []);
      }
    });
  });

  it('keeps the words for a buyer where an engineer gets the link', async () => {
    expect(await html('buyer', 'tomato')).toContain(
      'without a static threshold the squeeze check has nothing to judge against',
    );
    expect(await html('engineer', 'tomato')).toMatch(
      /without a static threshold the <a [^>]*href="\/checks\/squeeze"[^>]*>squeeze check<\/a> has nothing/,
    );
  });
});
