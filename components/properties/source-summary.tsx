import type { TableValue } from '@/lib/properties/table-rows';
import { ValueText } from '@/components/units/value-text';
import { ConditionText } from './condition-text';

/** A full stop after a text, unless it already ends in one (or in ? or !). */
const stop = (text: string) => (/[.!?]$/.test(text.trim()) ? '' : '.');

/** What a value rests on, in a few lines: source, how it was read, the conditions. */
export function SourceSummary({ label, value }: { label: string; value: TableValue }) {
  const s = value.source;
  return (
    <>
      <span className="block font-medium text-stone-900">
        {label}
        {value.variant ? (
          <>
            {' ('}
            <ConditionText text={value.variant} />)
          </>
        ) : null}
        :{' '}
        <span className="num">
          <ValueText value={value} />
        </span>
        .
      </span>
      {value.isTypicalDefault ? (
        <span className="mt-1 block text-clay-700">
          Typical default, not measured on this fruit.
        </span>
      ) : null}
      {s ? (
        <span className="mt-1 block">
          Source: {s.authors ?? 'Authors not named'}
          {s.year ? ` (${s.year})` : ''}. <cite className="not-italic">{s.title}</cite>
          {stop(s.title)}
          {s.venue ? ` ${s.venue}${stop(s.venue)}` : ''}
          {s.note ? <span data-prose=""> {s.note}</span> : null}
        </span>
      ) : (
        <span className="mt-1 block">Source: none given.</span>
      )}
      {value.conditions.length ? (
        <span className="mt-1 block text-stone-600">
          {value.conditions.map(([k, v]) => (
            <span key={k} className="block">
              {k}: <ConditionText text={v} label={k} />
              {stop(v)}
            </span>
          ))}
        </span>
      ) : (
        <span className="mt-1 block text-stone-600">Conditions: not stated.</span>
      )}
    </>
  );
}
