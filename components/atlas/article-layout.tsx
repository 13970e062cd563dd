import { formatDate } from '@/lib/dates';
import Link from 'next/link';
import type { ReactNode } from 'react';
import type { Article } from '@/lib/atlas/articles';
import { LINE_STAGES } from '@/lib/atlas/frontmatter';
import type { SourceRef } from '@/lib/properties/records';
import { Bibliography } from './bibliography';

const AUDIENCE = {
  engineer: 'Written for engineers',
  buyer: 'Written for buyers',
  both: 'For engineers and buyers',
};

/** An Atlas article: its heading and facts, the rendered body, the caution and the sources. */
export function ArticleLayout({
  article,
  sources,
  children,
}: {
  article: Article;
  sources: SourceRef[];
  children: ReactNode;
}) {
  const fm = article.frontmatter;
  return (
    <article className="mx-auto max-w-4xl" data-testid="atlas-article">
      <p className="text-sm">
        <Link href="/atlas" className="text-leaf-700 underline underline-offset-2">
          Atlas
        </Link>
      </p>
      <header className="mt-2 mb-6 border-b border-stone-200 pb-4">
        <h1 className="text-2xl font-semibold tracking-tight text-stone-900">
          {fm.title}
          {fm.status === 'draft' ? (
            <span className="ml-2 rounded bg-amber-100 px-2 text-sm text-amber-900">draft</span>
          ) : null}
        </h1>
        <p className="mt-2 max-w-3xl text-stone-700">{fm.summary}</p>
        <p className="mt-3 text-xs text-stone-500">
          {AUDIENCE[fm.audience]} · updated {formatDate(fm.updated)} · reviewed by{' '}
          {/^[aeiou]/.test(fm.reviewedBy) ? 'an' : 'a'} {fm.reviewedBy} · most bruise-prone stage:{' '}
          {LINE_STAGES[fm.mostProneStage]}
        </p>
        <p className="mt-3 flex flex-wrap gap-3 text-sm">
          <Link
            href={`/atlas/${article.slug}/sheet`}
            className="rounded-md border border-stone-300 bg-white px-3 py-1.5 hover:bg-stone-100"
          >
            Handling sheet
          </Link>
          <a
            href={`/api/atlas/${article.slug}/sheet.pdf`}
            className="rounded-md border border-stone-300 bg-white px-3 py-1.5 hover:bg-stone-100"
          >
            Handling sheet (PDF)
          </a>
        </p>
      </header>
      <div className="text-[0.95rem] text-stone-800 after:clear-both after:block after:content-['']">
        {children}
      </div>
      <Bibliography sources={sources} />
    </article>
  );
}
