import fs from 'node:fs';
import path from 'node:path';
import matter from 'gray-matter';
import { articleFrontmatterSchema, type ArticleFrontmatter } from './frontmatter';
import { inlineSourceKeys } from './sections';

export interface Article {
  /** The file name without `.mdx`; equal to the commodity slug. */
  slug: string;
  file: string;
  frontmatter: ArticleFrontmatter;
  /** The MDX body without its frontmatter. */
  body: string;
  /** Frontmatter keys first, then keys cited inline only, each once: the bibliography's order. */
  sourceKeys: string[];
  mtimeMs: number;
}

/** Where the articles live; tests point ATLAS_CONTENT_DIR at a folder of their own. */
export function contentDir(): string {
  return process.env.ATLAS_CONTENT_DIR ?? path.join(process.cwd(), 'content', 'atlas');
}

/** Parse and check one article file; a bad frontmatter names the file and the fields. */
export function readArticle(file: string): Article {
  const raw = fs.readFileSync(file, 'utf8');
  const { data, content } = matter(raw);
  const parsed = articleFrontmatterSchema.safeParse(data);
  const slug = path.basename(file, '.mdx');
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => `${i.path.join('.') || '(file)'}: ${i.message}`);
    throw new Error(
      `content/atlas/${slug}.mdx frontmatter is not valid:\n  ${issues.join('\n  ')}`,
    );
  }
  if (parsed.data.commodity !== slug) {
    throw new Error(`content/atlas/${slug}.mdx is about "${parsed.data.commodity}"; name it so.`);
  }
  const sourceKeys = [...new Set([...parsed.data.sources, ...inlineSourceKeys(content)])];
  return {
    slug,
    file,
    frontmatter: parsed.data,
    body: content,
    sourceKeys,
    mtimeMs: fs.statSync(file).mtimeMs,
  };
}

function loadAll(dir: string): Article[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((name) => name.endsWith('.mdx'))
    .sort()
    .map((name) => readArticle(path.join(dir, name)));
}

const cache: { dir: string; articles: Article[] } | { dir: null } = { dir: null };

/**
 * Every article, drafts included (callers filter by role). Read once per process in production,
 * where the files cannot change; re-read on each call elsewhere so edits show at once.
 */
export function listAllArticles(): Article[] {
  const dir = contentDir();
  if (process.env.NODE_ENV === 'production' && cache.dir === dir) {
    return (cache as { articles: Article[] }).articles;
  }
  const articles = loadAll(dir);
  Object.assign(cache, { dir, articles });
  return articles;
}

/** Articles a reader may see: drafts only for those who edit content. */
export function listArticles(options: { includeDrafts: boolean }): Article[] {
  return listAllArticles().filter(
    (a) => options.includeDrafts || a.frontmatter.status === 'published',
  );
}

export function findArticle(slug: string, options: { includeDrafts: boolean }) {
  return listArticles(options).find((a) => a.slug === slug) ?? null;
}
