import type { SourceRef } from '@/lib/properties/records';
import { SOURCE_KIND_LABELS, doiHref, safeHref } from '@/lib/properties/citation';

const LINK = 'text-leaf-700 underline wrap-anywhere';

/** A source in full: authors, year, title, venue, pages, DOI or address, and how it was read. */
export function SourceCitation({ source }: { source: SourceRef | null }) {
  if (!source) {
    return (
      <p className="text-sm text-clay-700">
        No source: a typical default used where no published value exists.
      </p>
    );
  }
  const doi = doiHref(source.doi);
  const url = safeHref(source.url);
  return (
    <div className="space-y-1 text-sm text-stone-700" data-testid="source-citation">
      <p>
        {source.authors ?? 'Authors not named'}
        {source.year ? ` (${source.year})` : ''}. <cite className="not-italic">{source.title}</cite>
        .{source.venue ? ` ${source.venue}` : ''}
        {source.pages ? `, p. ${source.pages}` : ''}
        {source.venue || source.pages ? '.' : ''}
        {doi ? (
          <>
            {' '}
            <a href={doi} className={LINK} rel="noreferrer">
              doi:{source.doi}
            </a>
          </>
        ) : source.doi ? (
          ` doi:${source.doi}`
        ) : null}
        {url ? (
          <>
            {' '}
            <a href={url} className={LINK} rel="noreferrer">
              {url}
            </a>
          </>
        ) : source.url ? (
          <span className="wrap-anywhere"> {source.url}</span>
        ) : null}
      </p>
      <p className="text-xs text-stone-500">
        {SOURCE_KIND_LABELS[source.kind]}
        {source.note ? (
          <>
            {' · How it was read: '}
            <span data-prose="">{source.note}</span>
          </>
        ) : null}
      </p>
    </div>
  );
}
