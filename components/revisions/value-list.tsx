import type { RevisionValue } from '@/lib/properties/records';
import { QUANTITIES } from '@/lib/properties/quantities';
import { citation } from './format';
import { ValueText } from '@/components/units/value-text';

const CONDITIONS: [keyof RevisionValue, string][] = [
  ['method', 'Method'],
  ['ripeness', 'Ripeness'],
  ['temperature', 'Temperature'],
  ['storage', 'Storage'],
  ['loadingRate', 'Loading rate'],
  ['probe', 'Probe or plate'],
  ['note', 'Note'],
];

function ValueItem({ v }: { v: RevisionValue }) {
  const conditions = CONDITIONS.filter(([k]) => v[k]);
  return (
    <li
      className="border-t border-stone-200 px-3 py-2 text-sm first:border-t-0"
      data-testid="value"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <span className="font-medium">
          {QUANTITIES[v.quantity].label}
          {v.variant ? ` (${v.variant})` : ''}
        </span>
        <span className="num">
          <ValueText value={v} />
          {v.samples !== null ? `, n = ${v.samples}` : ''}
        </span>
      </div>
      {conditions.length ? (
        <dl className="mt-1 grid gap-x-3 text-xs text-stone-600 sm:grid-cols-[8rem_minmax(0,1fr)]">
          {conditions.map(([k, label]) => (
            <div key={k} className="contents">
              <dt className="text-stone-500">{label}</dt>
              <dd className="mb-1 wrap-anywhere sm:mb-0">{String(v[k])}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      <p className="mt-1 text-xs text-stone-600">
        {v.source ? (
          <>
            Source <span className="font-mono">{v.source.key}</span>: {citation(v.source)}
          </>
        ) : v.isTypicalDefault ? (
          'Typical default: no measurement behind it.'
        ) : (
          'No source named.'
        )}
        {v.source && v.isTypicalDefault ? ' Marked as a typical default.' : ''}
      </p>
    </li>
  );
}

/** A revision's values, read-only, in entry order, each with its spread, conditions and source. */
export function ValueList({ values }: { values: RevisionValue[] }) {
  if (!values.length) {
    return <p className="text-sm text-stone-600">This revision holds no values.</p>;
  }
  return (
    <ul className="rounded-lg border border-stone-200 bg-white" data-testid="value-list">
      {values.map((v) => (
        <ValueItem key={v.id} v={v} />
      ))}
    </ul>
  );
}
