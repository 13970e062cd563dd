import { formatDateTime } from '@/lib/dates';
import type { AuditRow } from '@/lib/data/audit-reader';
import { describeAudit } from './audit-words';

const COLUMNS = 'md:grid-cols-[9.5rem_minmax(0,1fr)_minmax(0,1.6fr)_minmax(0,1.4fr)]';
const LABEL = 'text-xs text-stone-500 md:hidden';

/** The audit log in words: a table-like grid from md up, one stacked card per entry on phones. */
export function AuditList({
  entries,
  filtered = false,
}: {
  entries: AuditRow[];
  filtered?: boolean;
}) {
  if (entries.length === 0) {
    return (
      <p
        className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600"
        data-testid="audit-empty"
      >
        {filtered
          ? 'No entry matches this filter.'
          : 'Nothing has been recorded yet. Sign-ins, invitations and changes to users will appear here as they happen.'}
      </p>
    );
  }
  return (
    <div className="rounded-lg border border-stone-200 bg-white" data-testid="audit-list">
      <div
        className={`hidden gap-3 bg-stone-100 px-3 py-2 text-xs uppercase tracking-wide text-stone-600 md:grid ${COLUMNS}`}
      >
        <span>When</span>
        <span>Who</span>
        <span>What</span>
        <span>Record</span>
      </div>
      <ol>
        {entries.map((e) => {
          const words = describeAudit(e);
          return (
            <li
              key={e.id}
              className={`grid gap-1 border-t border-stone-200 px-3 py-2 text-sm first:border-t-0 md:gap-3 md:first:border-t ${COLUMNS}`}
              data-testid="audit-entry"
            >
              <time className="num text-xs" dateTime={e.createdAt}>
                {formatDateTime(e.createdAt)}
              </time>
              <span className="wrap-anywhere">
                <span className={LABEL}>Who: </span>
                {words.who}
                {e.actor ? <span className="block text-xs text-stone-500">{e.actor}</span> : null}
              </span>
              <span className="wrap-anywhere">
                <span className={LABEL}>Action: </span>
                {words.what}
              </span>
              <span className="wrap-anywhere">
                <span className={LABEL}>Record: </span>
                {words.record}
              </span>
            </li>
          );
        })}
      </ol>
    </div>
  );
}
