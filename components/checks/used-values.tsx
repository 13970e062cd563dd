import { TextInUnits } from '@/components/units/text-in-units';
import type { Text } from '@/lib/phrase';
import { Measure } from '@/components/units/measure';
import { RUNG_LABELS, type Rung } from '@/lib/evidence/rungs';

export interface UsedValueView {
  value: number;
  unit: string;
  rung: Rung;
  source: string | null;
  note: string | null;
  low?: number | null;
  high?: number | null;
  sd?: number | null;
  /** How the band the probability samples was chosen. */
  spread?: string | null;
}

/** The band a figure is sampled in, in the reader's units, with how it was chosen. */
function Band({ v }: { v: UsedValueView }) {
  if (!v.spread) return null;
  return (
    <span className="block text-stone-500" data-testid="spread">
      Spread:{' '}
      {v.sd != null ? (
        <>
          SD <Measure value={v.sd} unit={v.unit} />
        </>
      ) : v.low != null && v.high != null ? (
        <>
          <Measure value={v.low} unit={v.unit} />–<Measure value={v.high} unit={v.unit} />
        </>
      ) : null}{' '}
      ({v.spread})
    </span>
  );
}

/**
 * Which figure the check used for each input and the rung of evidence it came from, in words
 * (this cultivar's, the commodity's, derived, typical, or entered), with its source.
 */
export function UsedValues({ rows }: { rows: [string, UsedValueView | null | undefined][] }) {
  return (
    <table className="w-full text-left text-sm" data-testid="used-values">
      <caption className="mb-1 text-left text-xs font-medium uppercase tracking-wide text-stone-600">
        Inputs used, and where each came from
      </caption>
      <tbody>
        {rows.map(([label, v]) => (
          <tr key={label} className="border-t border-stone-200 align-top" data-rung={v?.rung}>
            <th scope="row" className="py-1 pr-2 font-normal text-stone-700">
              {label}
            </th>
            <td className="num py-1 pr-2">{v ? <Measure value={v.value} unit={v.unit} /> : '—'}</td>
            <td className="py-1 text-xs text-stone-600">
              {!v ? (
                'no value on any rung'
              ) : (
                <>
                  <span
                    className={
                      v.rung === 'typical'
                        ? 'font-medium text-amber-800'
                        : v.rung === 'own' || v.rung === 'entered'
                          ? 'font-medium text-stone-800'
                          : 'font-medium text-stone-700'
                    }
                    data-testid="rung"
                  >
                    {RUNG_LABELS[v.rung]}
                  </span>
                  {v.source ? ` — ${v.source}` : ''}
                  {v.note ? <span className="block text-stone-500">{v.note}</span> : null}
                  <Band v={v} />
                </>
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Warnings the model returned, in plain words beside the result. */
export function CheckWarnings({ warnings }: { warnings: Text[] }) {
  if (!warnings.length) return null;
  return (
    <ul
      className="space-y-1 rounded-md border border-amber-400 bg-amber-50 px-4 py-3 text-sm text-amber-900"
      data-testid="check-warnings"
    >
      {warnings.map((w, i) => (
        <li key={i}>
          <TextInUnits text={w} />
        </li>
      ))}
    </ul>
  );
}
