import Link from 'next/link';
import type { QueueRow } from '@/lib/data/editor-queue';
import { baseText, when } from './format';
import { StatusBadge } from './status-badge';

const COLUMNS = 'md:grid-cols-[minmax(0,1.6fr)_7rem_minmax(0,1fr)_minmax(0,1fr)_minmax(0,1.4fr)]';
const LABEL = 'text-xs text-stone-500 md:hidden';

/** The dates that matter for a revision's state, newest last. */
function dates(r: QueueRow): string[] {
  const out = [`started ${when(r.createdAt)}`];
  if (r.submittedAt) out.push(`submitted ${when(r.submittedAt)}`);
  if (r.status === 'returned' && r.reviewedAt) out.push(`returned ${when(r.reviewedAt)}`);
  if (r.publishedAt) out.push(`published ${when(r.publishedAt)}`);
  return out;
}

function Row({ r, testId, own }: { r: QueueRow; testId: string; own: boolean }) {
  return (
    <li
      className={`grid gap-1 border-t border-stone-200 px-3 py-2 text-sm first:border-t-0 md:gap-3 md:first:border-t ${COLUMNS}`}
      data-testid={testId}
    >
      <span className="min-w-0">
        <Link
          href={`/editor/revisions/${r.id}`}
          className="font-medium text-leaf-700 underline-offset-2 hover:underline"
        >
          {r.commodityName}, {r.cultivarName} — revision {r.number}
        </Link>
        {r.summary ? <span className="block text-xs text-stone-600">{r.summary}</span> : null}
      </span>
      <span>
        <StatusBadge status={r.status} />
        {own && r.status === 'in_review' ? (
          <span className="block text-xs text-stone-600">waiting for another editor</span>
        ) : null}
      </span>
      <span className="wrap-anywhere">
        <span className={LABEL}>Author: </span>
        {r.authorName}
      </span>
      <span>
        <span className={LABEL}>Based on: </span>
        {baseText(r.baseNumber)}
      </span>
      <span className="num text-xs text-stone-600">
        {dates(r).map((d) => (
          <span key={d} className="block">
            {d}
          </span>
        ))}
      </span>
      {r.status === 'returned' && r.reviewComment ? (
        <p
          className="rounded-md bg-red-50 px-2 py-1 text-xs text-red-900 md:col-span-5"
          data-testid="review-comment"
        >
          Returned by {r.reviewerName ?? 'a reviewer'}: “{r.reviewComment}”
        </p>
      ) : null}
    </li>
  );
}

/** A list of revisions: a table-like grid from md up, one stacked card per revision on phones. */
export function RevisionList({
  rows,
  empty,
  testId,
  own = false,
}: {
  rows: QueueRow[];
  empty: string;
  testId: string;
  /** The reader's own work: a revision in review is waiting for someone else. */
  own?: boolean;
}) {
  if (rows.length === 0) {
    return (
      <p
        className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-4 text-sm text-stone-600"
        data-testid={`${testId}-empty`}
      >
        {empty}
      </p>
    );
  }
  return (
    <div className="rounded-lg border border-stone-200 bg-white" data-testid={testId}>
      <div
        className={`hidden gap-3 bg-stone-100 px-3 py-2 text-xs uppercase tracking-wide text-stone-600 md:grid ${COLUMNS}`}
      >
        <span>Cultivar and revision</span>
        <span>Status</span>
        <span>Author</span>
        <span>Based on</span>
        <span>Dates</span>
      </div>
      <ol>
        {rows.map((r) => (
          <Row key={r.id} r={r} testId={`${testId}-row`} own={own} />
        ))}
      </ol>
    </div>
  );
}
