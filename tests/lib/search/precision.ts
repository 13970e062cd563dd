import type { SearchRecord, SearchResponse } from '@/lib/search/types';
import type { Answer, QueryCase } from './query-set';

/**
 * Scoring of the search benchmark, written apart from the engine: which records answer a query
 * (from the query set's rules, over the records' own text), and precision at 3 of what the search
 * box shows (groups in order, hits in order within a group: the first three rows a reader sees).
 */

/** Lower case, accents folded, ł ø đ as l o d (NFD leaves them whole); words of letters and digits. */
const words = (text: string) =>
  text
    .normalize('NFD')
    .replace(/\p{M}/gu, '')
    .toLowerCase()
    .replace(/ł/g, 'l')
    .replace(/ø/g, 'o')
    .replace(/đ/g, 'd')
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean);

const sameWord = (word: string, want: string) =>
  word === want ||
  word === `${want}s` ||
  word === `${want}es` ||
  (want.endsWith('y') && word === `${want.slice(0, -1)}ies`);

/** `text` holds the phrase: its words in order, side by side. */
export function holdsPhrase(text: string, phrase: string): boolean {
  const have = words(text);
  const want = words(phrase);
  for (let i = 0; i + want.length <= have.length; i++) {
    if (want.every((w, j) => sameWord(have[i + j], w))) return true;
  }
  return false;
}

function answers(record: SearchRecord, answer: Answer): boolean {
  if (typeof answer === 'string') return record.id === answer;
  if ('title' in answer) return holdsPhrase(record.title, answer.title);
  if ('about' in answer) return holdsPhrase(`${record.title} | ${record.subtitle}`, answer.about);
  const all = [record.title, record.subtitle, record.keywords, record.text].join(' | ');
  return holdsPhrase(all, answer.holds);
}

/** Ids of the records that answer a query. */
export function relevantIds(records: readonly SearchRecord[], c: QueryCase): Set<string> {
  return new Set(records.filter((r) => c.answers.some((a) => answers(r, a))).map((r) => r.id));
}

/** The ids a reader sees first: groups in order, hits in order. */
export const shownIds = (response: SearchResponse, n: number) =>
  response.groups.flatMap((g) => g.hits.map((h) => h.id)).slice(0, n);

export interface CaseResult {
  q: string;
  top: string[];
  relevant: number;
  /** Answers among the first three rows shown ÷ rows shown (at most 3); 0 when none is shown. */
  precision: number | null;
  /** At least one answer among the first three rows. */
  found: boolean | null;
  /** The named record leads (when the case names one). */
  firstRight: boolean | null;
  /** No answer exists and nothing was shown (for the no-answer cases). */
  emptyRight: boolean | null;
}

export function scoreCase(
  records: readonly SearchRecord[],
  c: QueryCase,
  response: SearchResponse,
): CaseResult {
  const relevant = relevantIds(records, c);
  const top = shownIds(response, 3);
  const hits = top.filter((id) => relevant.has(id)).length;
  const precision = relevant.size ? (top.length ? hits / top.length : 0) : null;
  return {
    q: c.q,
    top,
    relevant: relevant.size,
    precision,
    found: relevant.size ? hits > 0 : null,
    firstRight: c.first ? top[0] === c.first : null,
    emptyRight: relevant.size ? null : response.total === 0,
  };
}

export interface SetResult {
  cases: CaseResult[];
  /** Mean precision at 3 over the queries that have answers. */
  precisionAt3: number;
  /** Share of the queries with answers that show one among the first three rows. */
  foundAt3: number;
  /** Share of the named-first queries whose named record leads. */
  firstRight: number;
}

export function scoreSet(
  records: readonly SearchRecord[],
  cases: readonly QueryCase[],
  search: (q: string) => SearchResponse,
): SetResult {
  const results = cases.map((c) => scoreCase(records, c, search(c.q)));
  const p = results.flatMap((r) => (r.precision === null ? [] : [r.precision]));
  const share = (xs: (boolean | null)[]) => {
    const known = xs.filter((x) => x !== null);
    return known.filter(Boolean).length / known.length;
  };
  return {
    cases: results,
    precisionAt3: p.reduce((a, b) => a + b, 0) / p.length,
    foundAt3: share(results.map((r) => r.found)),
    firstRight: share(results.map((r) => r.firstRight)),
  };
}
