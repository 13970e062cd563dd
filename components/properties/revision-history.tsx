import Link from 'next/link';
import type { ReactNode } from 'react';
import type { RevisionSummary } from '@/lib/properties/records';
import { shortDate } from '@/lib/properties/citation';
import { STATUS_LABELS } from '@/lib/properties/revision-labels';

const TONE: Record<RevisionSummary['status'], string> = {
  draft: 'bg-stone-100 text-stone-700',
  in_review: 'bg-clay-50 text-clay-700',
  returned: 'bg-red-50 text-red-800',
  published: 'bg-leaf-100 text-leaf-900',
  superseded: 'bg-stone-100 text-stone-500',
};

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-stone-500">{label}</dt>
      <dd className="text-sm wrap-anywhere text-stone-800">{children}</dd>
    </div>
  );
}

/** Every revision the reader may see, newest first, with who did what when. */
export function RevisionHistory({
  revisions,
  canEdit,
}: {
  revisions: RevisionSummary[];
  canEdit: boolean;
}) {
  if (!revisions.length) return <p className="text-sm text-stone-600">No revision yet.</p>;
  return (
    <ol className="space-y-3" data-testid="revision-history">
      {revisions.map((r) => (
        <li key={r.id} className="rounded-lg border border-stone-200 bg-white p-3">
          <p className="flex flex-wrap items-center gap-2">
            <span className="font-semibold">
              Revision <span className="num">{r.number}</span>
            </span>
            <span className={`rounded px-1.5 text-xs ${TONE[r.status]}`}>
              {STATUS_LABELS[r.status]}
            </span>
            {r.isDemo ? (
              <span className="rounded bg-clay-50 px-1.5 text-xs text-clay-700">demo data</span>
            ) : null}
            {canEdit && ['draft', 'returned', 'in_review'].includes(r.status) ? (
              <Link href={`/editor/revisions/${r.id}`} className="text-sm text-leaf-700 underline">
                Open in the editor
              </Link>
            ) : null}
          </p>
          <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-1 sm:grid-cols-4">
            <Fact label="Author">{r.authorName}</Fact>
            <Fact label="Reviewer">{r.reviewerName ?? '—'}</Fact>
            <Fact label="Started">
              <span className="num">{shortDate(r.createdAt)}</span>
            </Fact>
            <Fact label="Submitted">
              <span className="num">{shortDate(r.submittedAt)}</span>
            </Fact>
            <Fact label="Reviewed">
              <span className="num">{shortDate(r.reviewedAt)}</span>
            </Fact>
            <Fact label="Published">
              <span className="num">{shortDate(r.publishedAt)}</span>
            </Fact>
            <Fact label="Superseded">
              <span className="num">{shortDate(r.supersededAt)}</span>
            </Fact>
          </dl>
          <dl className="mt-2 space-y-1">
            <Fact label="Summary">{r.summary ?? 'No summary given.'}</Fact>
            {r.reviewComment ? <Fact label="Review comment">{r.reviewComment}</Fact> : null}
          </dl>
        </li>
      ))}
    </ol>
  );
}
