import type { Range } from './types';

const WINDOW = 140;

/** Ranges worth marking: long enough to mean something for this query. */
export function usefulRanges(ranges: readonly Range[], query: string): Range[] {
  const min = Math.min(3, Math.max(1, query.trim().length));
  return ranges.filter(([s, e]) => e - s + 1 >= min);
}

/** A window of the text around its longest match, cut at word boundaries, ranges shifted into it. */
export function snippetOf(text: string, ranges: Range[]): { snippet: string; ranges: Range[] } {
  if (!text) return { snippet: '', ranges: [] };
  if (!ranges.length) {
    const cut = text.length > WINDOW ? text.slice(0, WINDOW).replace(/\s+\S*$/, '') + ' …' : text;
    return { snippet: cut, ranges: [] };
  }
  const best = [...ranges].sort((a, b) => b[1] - b[0] - (a[1] - a[0]))[0];
  let start = Math.max(0, best[0] - Math.floor(WINDOW / 3));
  let end = Math.min(text.length, start + WINDOW);
  if (start > 0) start = text.indexOf(' ', start) + 1 || start;
  if (end < text.length)
    end = text.lastIndexOf(' ', end) > best[1] ? text.lastIndexOf(' ', end) : end;
  const prefix = start > 0 ? '… ' : '';
  const suffix = end < text.length ? ' …' : '';
  const shifted = ranges
    .filter(([s, e]) => s >= start && e < end)
    .map(([s, e]): Range => [s - start + prefix.length, e - start + prefix.length]);
  return { snippet: prefix + text.slice(start, end) + suffix, ranges: shifted };
}
