import 'katex/dist/katex.min.css';
import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { ArticleLayout } from '@/components/atlas/article-layout';
import { listAllArticles } from '@/lib/atlas/articles';
import { getAtlasArticle } from '@/lib/atlas/entries';
import { renderArticle } from '@/components/atlas/render-article';
import { requirePageActor } from '@/lib/auth/session';

type Props = { params: Promise<{ commodity: string }> };

// Read and checked when the route module loads, so `next build` stops on a bad frontmatter.
listAllArticles();

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const actor = await requirePageActor('atlas:read');
  const found = await getAtlasArticle(actor, (await params).commodity);
  return { title: found ? found.article.frontmatter.title : 'Not found' };
}

export default async function AtlasArticlePage({ params }: Props) {
  const actor = await requirePageActor('atlas:read');
  const found = await getAtlasArticle(actor, (await params).commodity);
  if (!found) notFound();
  const { content, sources } = await renderArticle(actor, found.article);
  return (
    <ArticleLayout article={found.article} sources={sources}>
      {content}
    </ArticleLayout>
  );
}
