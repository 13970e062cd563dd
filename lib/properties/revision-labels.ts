import type { RevisionStatus } from './quantities';

export const STATUS_LABELS: Record<RevisionStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  returned: 'Returned to its author',
  published: 'Published',
  superseded: 'Superseded',
};

/** The two revisions a comparison starts from: the one before the newest, and the newest. */
export function defaultPair(numbers: number[]): { from: number; to: number } | null {
  const sorted = [...numbers].sort((a, b) => b - a);
  if (!sorted.length) return null;
  return { from: sorted[1] ?? sorted[0], to: sorted[0] };
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
