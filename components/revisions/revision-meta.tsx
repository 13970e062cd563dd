import type { ReactNode } from 'react';
import Link from 'next/link';
import type { RevisionSummary } from '@/lib/properties/records';
import { baseText, when } from './format';
import { StatusBadge } from './status-badge';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-stone-500">{label}</dt>
      <dd className="wrap-anywhere">{children}</dd>
    </div>
  );
}

/** Who, when and from what: the facts of one revision, and the reviewer's comment if returned. */
export function RevisionMeta({
  revision,
  cultivarSlug,
  baseNumber,
}: {
  revision: RevisionSummary;
  cultivarSlug: string;
  baseNumber: number | null;
}) {
  const r = revision;
  return (
    <div className="space-y-3" data-testid="revision-meta">
      <dl className="grid grid-cols-2 gap-3 rounded-lg border border-stone-200 bg-white p-3 text-sm sm:grid-cols-4">
        <Fact label="Status">
          <StatusBadge status={r.status} />
        </Fact>
        <Fact label="Author">{r.authorName}</Fact>
        <Fact label="Based on">{baseText(baseNumber)}</Fact>
        <Fact label="Started">
          <span className="num text-xs">{when(r.createdAt)}</span>
        </Fact>
        {r.submittedAt ? (
          <Fact label="Submitted">
            <span className="num text-xs">{when(r.submittedAt)}</span>
          </Fact>
        ) : null}
        {r.reviewerName ? (
          <Fact label={r.status === 'returned' ? 'Returned by' : 'Reviewed by'}>
            {r.reviewerName} <span className="num text-xs">{when(r.reviewedAt)}</span>
          </Fact>
        ) : null}
        {r.publishedAt ? (
          <Fact label="Published">
            <span className="num text-xs">{when(r.publishedAt)}</span>
          </Fact>
        ) : null}
        {r.supersededAt ? (
          <Fact label="Superseded">
            <span className="num text-xs">{when(r.supersededAt)}</span>
          </Fact>
        ) : null}
        <Fact label="Cultivar page">
          <Link
            href={`/properties/${cultivarSlug}`}
            className="text-leaf-700 underline-offset-2 hover:underline"
          >
            /properties/{cultivarSlug}
          </Link>
        </Fact>
      </dl>
      {r.summary ? <p className="text-sm text-stone-700">{r.summary}</p> : null}
      {r.status === 'returned' && r.reviewComment ? (
        <div
          className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-sm text-red-900"
          data-testid="review-comment"
        >
          <p className="font-medium">Returned by {r.reviewerName ?? 'a reviewer'}:</p>
          <p className="whitespace-pre-wrap wrap-anywhere">{r.reviewComment}</p>
        </div>
      ) : null}
    </div>
  );
}
