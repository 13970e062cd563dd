import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import '../../support/session';
import { freshDatabase, userId } from '../../support/db';
import { ACCOUNTS } from '../../support/accounts';
import { COMMODITIES } from '@/seeds/property-data/commodities';
import { SOURCES } from '@/seeds/property-data/sources';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { listAllArticles, readArticle } from '@/lib/atlas/articles';
import { articleFrontmatterSchema } from '@/lib/atlas/frontmatter';
import { renderArticle } from '@/components/atlas/render-article';
import { cardCultivars, inlineSourceKeys, topHeadings } from '@/lib/atlas/sections';
import { renderHtml } from './render-html';

const articles = listAllArticles();
const seededCommodities = COMMODITIES.map((c) => c.slug);
const seededCultivars = COMMODITIES.flatMap((c) => c.cultivars.map((cv) => cv.slug));
const seededSources = SOURCES.map((s) => s.key);

/** The section plan every article follows (content/atlas/README.md), written out by hand. */
const TOP_SECTIONS = [
  'Ripeness, temperature and storage',
  'Along the line',
  'What to measure and how',
  'Formulas',
  'Cautions',
];
const LINE_STAGE_HEADINGS = [
  'Receiving and bin tipping',
  'Water or dry dumping',
  'Singulation',
  'Sizing and grading',
  'Packing',
  'Palletising',
  'Cold chain and transport',
];

let buyer: Actor;
beforeAll(async () => {
  await freshDatabase();
  buyer = (await getActiveActor(await userId(ACCOUNTS.buyer)))!;
});

describe('Atlas articles', () => {
  it('include the apple and kiwifruit articles', () => {
    expect(articles.map((a) => a.slug)).toEqual(expect.arrayContaining(['apple', 'kiwifruit']));
  });

  describe.each(articles.map((a) => [a.slug, a] as const))('%s', (_slug, article) => {
    it('has a frontmatter that validates', () => {
      const result = articleFrontmatterSchema.safeParse(article.frontmatter);
      expect(result.error?.issues ?? []).toEqual([]);
    });

    it('is about a seeded commodity and shows seeded cultivars', () => {
      expect(seededCommodities).toContain(article.frontmatter.commodity);
      for (const slug of [...article.frontmatter.keyCultivars, ...cardCultivars(article.body)]) {
        expect(seededCultivars).toContain(slug);
      }
    });

    it('cites only seeded source keys, in the frontmatter and inline', () => {
      const keys = [...article.frontmatter.sources, ...inlineSourceKeys(article.body)];
      expect(keys.filter((k) => !seededSources.includes(k))).toEqual([]);
    });

    it('follows the section plan: how it bruises first, the seven line stages, cautions last', () => {
      const headings = topHeadings(article.body);
      expect(headings[0]).toMatch(/^How .+ bruises?$/);
      expect(headings.slice(1)).toEqual(TOP_SECTIONS);
      const stages = [...article.body.matchAll(/^###\s+(.+)$/gm)].map((m) => m[1].trim());
      expect(stages).toEqual(LINE_STAGE_HEADINGS);
      expect(article.body).toContain('<StandingCaution />');
    });

    it('never starts a line with an inline component (it would become a paragraph of its own)', () => {
      const lines = article.body.split('\n').filter((l) => /^<(SourceRef|MarginBadge)\b/.test(l));
      expect(lines).toEqual([]);
    });

    it('renders: formulas through KaTeX, the GFM table, live cards, citations and anchors', async () => {
      const { content, sources } = await renderArticle(buyer, article);
      const html = await renderHtml(content);
      expect(html).toContain('class="katex-display"');
      expect(html).not.toContain('katex-error');
      expect(html).toMatch(/<table[^>]*>[\s\S]*<th[^>]*>Line stage<\/th>/);
      expect(html).toContain('id="along-the-line"');
      for (const slug of cardCultivars(article.body)) {
        expect(html).toContain(`data-testid="live-values-${slug}"`);
      }
      for (const key of inlineSourceKeys(article.body)) expect(html).toContain(`#source-${key}`);
      expect(sources.map((s) => s.key)).toEqual(article.sourceKeys);
    });
  });
});

describe('Atlas content errors', () => {
  const dirs: string[] = [];
  const write = (name: string, text: string) => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'atlas-'));
    dirs.push(dir);
    fs.writeFileSync(path.join(dir, name), text);
    return path.join(dir, name);
  };
  afterEach(() => dirs.splice(0).forEach((d) => fs.rmSync(d, { recursive: true, force: true })));
  const apple = fs.readFileSync(path.join(process.cwd(), 'content/atlas/apple.mdx'), 'utf8');

  it('a frontmatter with a bad field is refused, naming the file and the field', () => {
    const file = write('apple.mdx', apple.replace('audience: both', 'audience: everyone'));
    expect(() => readArticle(file)).toThrow(/apple\.mdx frontmatter[\s\S]*audience/);
  });

  it('a file named for another commodity than its frontmatter is refused', () => {
    const file = write('pear.mdx', apple);
    expect(() => readArticle(file)).toThrow(/is about "apple"/);
  });

  it('an unknown source key cited inline is an error, not a blank citation', async () => {
    const file = write('apple.mdx', `${apple}\n\nSee <SourceRef id="no-such-source-1999" />.\n`);
    await expect(renderArticle(buyer, readArticle(file))).rejects.toThrow(/no-such-source-1999/);
  });
});
