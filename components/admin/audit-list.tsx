import { formatDateTime } from '@/lib/dates';
import type { AuditRow } from '@/lib/data/audit-reader';

const COLUMNS = 'md:grid-cols-[9.5rem_minmax(0,1.3fr)_minmax(0,1fr)_minmax(0,0.8fr)_minmax(0,2fr)]';
const LABEL = 'text-xs text-stone-500 md:hidden';

/** The audit log: a table-like grid from md up, one stacked card per entry on phones. */
export function AuditList({ entries }: { entries: AuditRow[] }) {
  if (entries.length === 0) {
    return (
      <p
        className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600"
        data-testid="audit-empty"
      >
        Nothing has been recorded yet. Sign-ins, invitations and changes to users will appear here
        as they happen.
      </p>
    );
  }
  return (
    <div className="rounded-lg border border-stone-200 bg-white" data-testid="audit-list">
      <div
        className={`hidden gap-3 bg-stone-100 px-3 py-2 text-xs uppercase tracking-wide text-stone-600 md:grid ${COLUMNS}`}
      >
        <span>When (UTC)</span>
        <span>Who</span>
        <span>Action</span>
        <span>Record</span>
        <span>Detail</span>
      </div>
      <ol>
        {entries.map((e) => (
          <li
            key={e.id}
            className={`grid gap-1 border-t border-stone-200 px-3 py-2 text-sm first:border-t-0 md:gap-3 md:first:border-t ${COLUMNS}`}
            data-testid="audit-entry"
          >
            <span className="num text-xs">{formatDateTime(e.createdAt)}</span>
            <span className="wrap-anywhere">
              <span className={LABEL}>Who: </span>
              {e.actor ?? '—'}
            </span>
            <span>
              <span className={LABEL}>Action: </span>
              {e.action}
            </span>
            <span>
              <span className={LABEL}>Record: </span>
              {e.entity} {e.entityId}
            </span>
            <span className="font-mono text-xs wrap-anywhere text-stone-700">{e.detail}</span>
          </li>
        ))}
      </ol>
    </div>
  );
}
