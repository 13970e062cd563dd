import { type DiffRow, type DiffValue } from '@/lib/properties/diff';
import { ValueText } from '@/components/units/value-text';

const CHANGE: Record<DiffRow['change'], { text: string; tone: string }> = {
  added: { text: 'Added', tone: 'bg-leaf-50 text-leaf-900' },
  removed: { text: 'Removed', tone: 'bg-red-50 text-red-800' },
  changed: { text: 'Changed', tone: 'bg-amber-50 text-amber-900' },
  same: { text: 'Unchanged', tone: 'bg-stone-100 text-stone-600' },
};
const COLUMNS = 'md:grid-cols-[minmax(0,1.4fr)_6.5rem_minmax(0,1fr)_minmax(0,1fr)]';
const LABEL = 'text-xs text-stone-500 md:hidden';

function Values({ values }: { values: DiffValue[] }) {
  if (!values.length) return <span className="text-stone-400">—</span>;
  return (
    <>
      {values.map((v, i) => (
        <span key={i} className="num block">
          <ValueText value={v} />
          {v.sourceKey ? <span className="text-xs text-stone-500"> [{v.sourceKey}]</span> : null}
        </span>
      ))}
    </>
  );
}

/** Each quantity slot of the base against this revision: added, removed, changed or unchanged. */
export function RevisionDiff({ rows, baseLabel }: { rows: DiffRow[]; baseLabel: string }) {
  const changed = rows.filter((r) => r.change !== 'same').length;
  return (
    <div data-testid="revision-diff">
      <p className="mb-2 text-sm text-stone-600">
        {changed === 0
          ? `No value differs from ${baseLabel}.`
          : `${changed} of ${rows.length} ${rows.length === 1 ? 'quantity' : 'quantities'} ${changed === 1 ? 'differs' : 'differ'} from ${baseLabel}.`}
      </p>
      <div className="rounded-lg border border-stone-200 bg-white">
        <div
          className={`hidden gap-3 bg-stone-100 px-3 py-2 text-xs uppercase tracking-wide text-stone-600 md:grid ${COLUMNS}`}
        >
          <span>Quantity</span>
          <span>Change</span>
          <span>Before ({baseLabel})</span>
          <span>This revision</span>
        </div>
        <ol>
          {rows.map((r) => (
            <li
              key={`${r.quantity}-${r.variant}`}
              className={`grid gap-1 border-t border-stone-200 px-3 py-2 text-sm first:border-t-0 md:gap-3 md:first:border-t ${COLUMNS} ${r.change === 'same' ? '' : 'bg-amber-50/40'}`}
              data-testid="diff-row"
              data-change={r.change}
            >
              <span className="font-medium">{r.label}</span>
              <span>
                <span className={`rounded px-1.5 py-0.5 text-xs ${CHANGE[r.change].tone}`}>
                  {CHANGE[r.change].text}
                </span>
              </span>
              <span>
                <span className={LABEL}>Before: </span>
                <Values values={r.before} />
              </span>
              <span>
                <span className={LABEL}>After: </span>
                <Values values={r.after} />
              </span>
            </li>
          ))}
        </ol>
      </div>
    </div>
  );
}
