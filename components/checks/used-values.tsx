import { Measure } from '@/components/units/measure';

export interface UsedValueView {
  value: number;
  unit: string;
  origin: 'published' | 'derived' | 'entered' | 'typical default';
  source: string | null;
}

/** Which figure the check used for each input, and where it came from. */
export function UsedValues({ rows }: { rows: [string, UsedValueView | null | undefined][] }) {
  return (
    <table className="w-full text-left text-sm" data-testid="used-values">
      <caption className="mb-1 text-left text-xs font-medium uppercase tracking-wide text-stone-600">
        Inputs used
      </caption>
      <tbody>
        {rows.map(([label, v]) => (
          <tr key={label} className="border-t border-stone-200 align-top">
            <th scope="row" className="py-1 pr-2 font-normal text-stone-700">
              {label}
            </th>
            <td className="num py-1 pr-2">{v ? <Measure value={v.value} unit={v.unit} /> : '—'}</td>
            <td className="py-1 text-xs text-stone-600">
              {!v
                ? 'no published value'
                : v.origin === 'entered'
                  ? 'entered'
                  : v.origin === 'derived'
                    ? `derived${v.source ? ` — ${v.source}` : ''}`
                    : v.origin === 'typical default'
                      ? `typical default, no source${v.source ? ` — ${v.source}` : ''}`
                      : `published${v.source ? ` — ${v.source}` : ''}`}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Warnings the model returned, in plain words beside the result. */
export function CheckWarnings({ warnings }: { warnings: string[] }) {
  if (!warnings.length) return null;
  return (
    <ul
      className="space-y-1 rounded-md border border-amber-400 bg-amber-50 px-4 py-3 text-sm text-amber-900"
      data-testid="check-warnings"
    >
      {warnings.map((w) => (
        <li key={w}>{w}</li>
      ))}
    </ul>
  );
}
