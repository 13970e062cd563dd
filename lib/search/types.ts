/** The longest query the search accepts (the box stops typing there; the API answers 400). */
export const MAX_QUERY_LENGTH = 100;

/** What a search result can be, in the order the results box shows the groups. */
export const SEARCH_KINDS = ['commodity', 'cultivar', 'section', 'source'] as const;
export type SearchKind = (typeof SEARCH_KINDS)[number];

export const KIND_LABELS: Record<SearchKind, string> = {
  commodity: 'Commodities',
  cultivar: 'Cultivars',
  section: 'Article sections',
  source: 'Sources',
};

/** One searchable thing, as the server indexes it. */
export interface SearchRecord {
  id: string;
  kind: SearchKind;
  title: string;
  subtitle: string;
  href: string | null;
  /** Extra names it answers to (slugs, botanical names, authors, quantities). */
  keywords: string;
  /** Body text (an article section's words); empty for short records. */
  text: string;
}

/** Start and end (inclusive) of a matched stretch of characters. */
export type Range = [number, number];

export interface SearchHit {
  id: string;
  kind: SearchKind;
  title: string;
  subtitle: string;
  href: string | null;
  titleRanges: Range[];
  /** A short stretch of the text around the best match, with its own ranges. */
  snippet: string;
  snippetRanges: Range[];
}

export interface SearchGroup {
  kind: SearchKind;
  label: string;
  hits: SearchHit[];
}

export interface SearchResponse {
  query: string;
  total: number;
  groups: SearchGroup[];
}
