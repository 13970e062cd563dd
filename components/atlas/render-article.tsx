import 'server-only';
import type { MDXComponents } from 'mdx/types';
import { compileMDX } from 'next-mdx-remote/rsc';
import { createElement, type ComponentType, type ReactElement, type ReactNode } from 'react';
import rehypeKatex from 'rehype-katex';
import remarkGfm from 'remark-gfm';
import remarkMath from 'remark-math';
import { atlasComponents } from '@/mdx-components';
import { CheckLink } from '@/components/atlas/check-link';
import { LiveValues } from '@/components/atlas/live-values';
import { SourceRefLink } from '@/components/atlas/source-ref';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/roles';
import type { SourceRef } from '@/lib/properties/records';
import type { Article } from '@/lib/atlas/articles';
import { getSourcesByKeys, UnknownSourceError } from '@/lib/atlas/sources';

type Content = ComponentType<{ components: MDXComponents }>;
const compiled = new Map<string, { mtimeMs: number; Content: Content }>();

/**
 * Compile an article's MDX once per file version. Expressions stay on (`margin={1.6}` is a
 * number) but the compiler's guard against dangerous ones (eval, process, …) stays on too.
 */
export async function compileArticle(article: Article): Promise<Content> {
  const hit = compiled.get(article.file);
  if (hit && hit.mtimeMs === article.mtimeMs) return hit.Content;
  const { content } = await compileMDX({
    source: article.body,
    options: {
      blockJS: false,
      blockDangerousJS: true,
      mdxOptions: {
        remarkPlugins: [remarkGfm, remarkMath],
        rehypePlugins: [[rehypeKatex, { throwOnError: true, strict: 'error' }]],
      },
    },
  });
  const Content = content.type as Content;
  compiled.set(article.file, { mtimeMs: article.mtimeMs, Content });
  return Content;
}

/** The article's components bound to this reader and its resolved sources. */
function boundComponents(actor: Actor, sources: SourceRef[]): MDXComponents {
  const byKey = new Map(sources.map((s) => [s.key, s]));
  const cited = new Set(byKey.keys());
  return {
    ...atlasComponents,
    SourceRef: ({ id }: { id: string }) => {
      const source = byKey.get(id);
      if (!source) throw new UnknownSourceError([String(id)]);
      return <SourceRefLink source={source} />;
    },
    // Only a reader who may run checks gets links to them (a buyer reads the words alone).
    CheckLink: ({ check, children }: { check: string; children?: ReactNode }) => (
      <CheckLink check={check} mayRun={can(actor.role, 'checks:run')}>
        {children}
      </CheckLink>
    ),
    LiveValues: ({ cultivar }: { cultivar: string }) => (
      <LiveValues actor={actor} cultivar={cultivar} citedKeys={cited} />
    ),
  };
}

/** The article as React content plus its bibliography; unknown source keys throw. */
export async function renderArticle(
  actor: Actor,
  article: Article,
): Promise<{ content: ReactElement; sources: SourceRef[] }> {
  const [sources, Content] = await Promise.all([
    getSourcesByKeys(actor, article.sourceKeys),
    compileArticle(article),
  ]);
  return {
    content: createElement(Content, { components: boundComponents(actor, sources) }),
    sources,
  };
}
