import type { RevisionValue } from '@/lib/properties/records';
import { conditionsOf } from '@/lib/properties/table-rows';
import { ConditionText } from './condition-text';
import { SourceCitation } from './source-citation';
import { ValueText } from '@/components/units/value-text';

/** One published value: the number with unit and spread, its conditions and its source. */
export function ValueCard({ value }: { value: RevisionValue }) {
  const conditions = conditionsOf(value);
  return (
    <li className="rounded-md border border-stone-200 bg-white p-3" data-testid="value-card">
      <p className="flex flex-wrap items-baseline gap-x-2 gap-y-1">
        <span className="num text-base font-semibold text-stone-900">
          <ValueText value={value} />
        </span>
        {value.variant ? (
          <span className="rounded bg-stone-100 px-1.5 text-xs text-stone-700">
            <ConditionText text={value.variant} />
          </span>
        ) : null}
        {value.sd !== null && value.low === null ? (
          <span className="text-xs text-stone-500">± is one standard deviation</span>
        ) : null}
        {value.isTypicalDefault ? (
          <span className="rounded bg-clay-50 px-1.5 text-xs text-clay-700">
            Typical default, not measured on this cultivar
          </span>
        ) : null}
      </p>
      {conditions.length ? (
        <dl className="mt-2 grid gap-x-3 gap-y-0.5 text-sm sm:grid-cols-[8rem_minmax(0,1fr)]">
          {conditions.map(([k, v]) => (
            <div key={k} className="contents">
              <dt className="text-stone-500">{k}</dt>
              <dd className="text-stone-800">
                <ConditionText text={v} label={k} />
              </dd>
            </div>
          ))}
        </dl>
      ) : (
        <p className="mt-2 text-sm text-stone-500">The source states no conditions.</p>
      )}
      <div className="mt-2 border-t border-stone-100 pt-2">
        <SourceCitation source={value.source} />
      </div>
    </li>
  );
}
