import { formatDateTime } from '@/lib/dates';
import type { SourceRef } from '@/lib/properties/records';
import type { RevisionStatus } from '@/lib/properties/quantities';

export const STATUS_LABEL: Record<RevisionStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  returned: 'Returned',
  published: 'Published',
  superseded: 'Superseded',
};

/** An ISO time as `2026-12-02 14:05 UTC`, or a dash. */
export function when(iso: string | null): string {
  return formatDateTime(iso);
}

/** A source as one line: authors (year) title. */
export function citation(s: Pick<SourceRef, 'authors' | 'year' | 'title'>): string {
  const year = s.year ? ` (${s.year})` : '';
  return `${s.authors ?? 'Unknown author'}${year} ${s.title}`;
}

/** "revision 3", or "nothing published" when a draft started from an empty record. */
export function baseText(number: number | null): string {
  return number === null ? 'nothing published' : `revision ${number}`;
}
