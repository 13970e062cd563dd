import type { RevisionStatus } from './quantities';

export const STATUS_LABELS: Record<RevisionStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  returned: 'Returned to its author',
  published: 'Published',
  superseded: 'Superseded',
};

/**
 * The comparison's pair when the address names one end or neither: the newest as "after", and as
 * "before" the revision just older than "after" (so `?to=3` compares 2 with 3, never 5 with 3);
 * with only one revision, that one on both sides.
 */
export function pairAround(
  numbers: number[],
  chosen: { from?: number | null; to?: number | null } = {},
): { from: number; to: number } | null {
  const sorted = [...new Set(numbers)].sort((a, b) => b - a);
  if (!sorted.length) return null;
  const to = chosen.to ?? sorted[0];
  const from = chosen.from ?? sorted.find((n) => n < to) ?? to;
  return { from, to };
}

/**
 * A revision number from the address (`?from=`/`?to=`), checked against the ones the reader may
 * see: missing → the fallback; text or an unknown number → null and a plain-words problem.
 */
export function chosenRevision(
  raw: string | string[] | undefined,
  visible: number[],
  fallback: number | null,
): { number: number | null; problem: string | null } {
  const text = Array.isArray(raw) ? raw[0] : raw;
  if (text === undefined || text === '') return { number: fallback, problem: null };
  if (!/^\d{1,9}$/.test(text)) {
    return { number: null, problem: `“${text.slice(0, 20)}” is not a revision number.` };
  }
  const n = Number(text);
  return visible.includes(n)
    ? { number: n, problem: null }
    : { number: null, problem: `There is no revision ${n} of this cultivar that you may see.` };
}
