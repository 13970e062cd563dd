import type { SourceRef } from '@/lib/properties/records';

/** Family names from an author list written `Wang, J.; Wang, C.; Wu, J.` (an `et al.` kept as a flag). */
function familyNames(authors: string | null): { names: string[]; more: boolean } {
  const parts = (authors ?? '')
    .split(';')
    .map((a) => a.split(',')[0].trim())
    .filter(Boolean);
  const names = parts.filter((p) => !/^et al\.?$/i.test(p));
  return { names, more: names.length < parts.length };
}

/** A long venue or title cut at a word near 28 characters. */
function clip(text: string): string {
  if (text.length <= 28) return text;
  return `${text.slice(0, 28).replace(/\s+\S*$/, '')}…`;
}

/**
 * The in-text form: `Wang et al., 2024`, `Chappell and Hamann, 1968`, `Shahabasi, 1979`. A source
 * without authors goes by its venue (or the start of its title); one without a year says `n.d.`.
 */
export function shortCitation(
  source: Pick<SourceRef, 'authors' | 'year' | 'title'> & { venue?: string | null },
): string {
  const { names, more } = familyNames(source.authors);
  const who =
    names.length === 0
      ? clip(source.venue ?? source.title)
      : names.length === 1 && !more
        ? names[0]
        : names.length === 2 && !more
          ? `${names[0]} and ${names[1]}`
          : `${names[0]} et al.`;
  return `${who}, ${source.year ?? 'n.d.'}`;
}

/** One bibliography line: authors (year). Title. Venue, pages. */
export function fullReference(source: SourceRef): string {
  const head = [source.authors, source.year ? `(${source.year})` : null].filter(Boolean).join(' ');
  const where = [source.venue, source.pages].filter(Boolean).join(', ');
  return [head, source.title, where].filter(Boolean).join('. ') + '.';
}

/** A followable address for a source: its DOI resolver, else an http(s) URL; never `javascript:`. */
export function sourceHref(source: Pick<SourceRef, 'doi' | 'url'>): string | null {
  const doi = source.doi?.replace(/^(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:)/i, '');
  if (doi && /^10\.\d{4,9}\/\S+$/.test(doi)) return `https://doi.org/${doi}`;
  return source.url && /^https?:\/\//i.test(source.url) ? source.url : null;
}
