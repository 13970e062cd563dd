import Fuse, { type FuseResult, type IFuseOptions } from 'fuse.js';
import { snippetOf, usefulRanges } from './snippet';
import {
  KIND_LABELS,
  SEARCH_KINDS,
  type Range,
  type SearchHit,
  type SearchRecord,
  type SearchResponse,
} from './types';

/**
 * Fuzzy search over one role class's records. Each query word is matched on its own, so words in
 * any order, misspelt ("Jonathn") or cut short ("kiwi") still find their record.
 */
const OPTIONS: IFuseOptions<SearchRecord> = {
  keys: [
    { name: 'title', weight: 3 },
    { name: 'keywords', weight: 1.5 },
    { name: 'subtitle', weight: 1 },
    { name: 'text', weight: 1 },
  ],
  includeMatches: true,
  includeScore: true,
  ignoreLocation: true,
  ignoreDiacritics: true,
  // Long section bodies would otherwise always rank below a short title with the same match.
  ignoreFieldNorm: true,
  threshold: 0.3,
  minMatchCharLength: 2,
  useTokenSearch: true,
  tokenMatch: 'all',
};

const PER_GROUP = 6;

export interface SearchIndex {
  size: number;
  /** What this index can find (tests read it to check a role class holds nothing more). */
  records: readonly SearchRecord[];
  search(query: string): SearchResponse;
}

function rangesOf(result: FuseResult<SearchRecord>, key: string, query: string): Range[] {
  const match = result.matches?.find((m) => m.key === key);
  return match ? usefulRanges(match.indices as Range[], query) : [];
}

function toHit(result: FuseResult<SearchRecord>, query: string): SearchHit {
  const r = result.item;
  const body = r.text || r.keywords;
  const { snippet, ranges } = snippetOf(
    body,
    rangesOf(result, r.text ? 'text' : 'keywords', query),
  );
  return {
    id: r.id,
    kind: r.kind,
    title: r.title,
    subtitle: r.subtitle,
    href: r.href,
    titleRanges: rangesOf(result, 'title', query),
    snippet,
    snippetRanges: ranges,
  };
}

export function createSearchIndex(records: SearchRecord[]): SearchIndex {
  const fuse = new Fuse(records, OPTIONS, Fuse.createIndex(OPTIONS.keys!, records));
  return {
    size: records.length,
    records,
    search(raw) {
      const query = raw.trim();
      if (!query) return { query, total: 0, groups: [] };
      const results = fuse.search(query);
      // Groups come in the order of their best hit, so "Wang" shows sources before near-misses.
      const best = (kind: string) => results.findIndex((res) => res.item.kind === kind);
      const groups = SEARCH_KINDS.filter((kind) => best(kind) >= 0)
        .sort((a, b) => best(a) - best(b))
        .map((kind) => ({
          kind,
          label: KIND_LABELS[kind],
          hits: results
            .filter((res) => res.item.kind === kind)
            .slice(0, PER_GROUP)
            .map((res) => toHit(res, query)),
        }));
      return { query, total: results.length, groups };
    },
  };
}
