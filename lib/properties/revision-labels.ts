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
