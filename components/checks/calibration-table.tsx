'use client';

import { useUnits } from '@/components/units/units-provider';
import type { CalibrationRow, Phrase } from '@/lib/checks/calibration';

function PhraseText({ phrase }: { phrase: Phrase }) {
  const u = useUnits();
  return <>{phrase.map((p) => (typeof p === 'string' ? p : u.show(p.value, p.unit))).join('')}</>;
}

const CHECK_NAMES = { squeeze: 'Squeeze', stack: 'Stack', drop: 'Drop' } as const;

/** The checks against the published record: every row with its rule, agreeing or not. */
export function CalibrationTable({ rows }: { rows: CalibrationRow[] }) {
  const checks = (['squeeze', 'stack', 'drop'] as const).filter((c) =>
    rows.some((r) => r.check === c),
  );
  return (
    <div className="space-y-6">
      <ul className="grid gap-3 sm:grid-cols-3" aria-label="Agreement per check">
        {checks.map((c) => {
          const mine = rows.filter((r) => r.check === c);
          const agree = mine.filter((r) => r.agrees).length;
          return (
            <li
              key={c}
              className="rounded-lg border border-stone-200 bg-white p-3 text-sm"
              data-testid={`calibration-count-${c}`}
            >
              <span className="font-semibold">{CHECK_NAMES[c]}</span>: {agree} of {mine.length}{' '}
              published outcomes agree
            </li>
          );
        })}
      </ul>
      {checks.map((c) => (
        <section key={c} className="space-y-2">
          <h2 className="text-base font-semibold">{CHECK_NAMES[c]} check</h2>
          <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
            <table className="w-full min-w-[40rem] text-left text-sm">
              <thead className="bg-stone-50 text-xs uppercase tracking-wide text-stone-600">
                <tr>
                  <th className="px-3 py-2">Case</th>
                  <th className="px-3 py-2">Published outcome</th>
                  <th className="px-3 py-2">The check predicts</th>
                  <th className="px-3 py-2">Agreement</th>
                </tr>
              </thead>
              <tbody>
                {rows
                  .filter((r) => r.check === c)
                  .map((r, i) => (
                    <tr key={i} className="border-t border-stone-100 align-top">
                      <td className="px-3 py-2">{r.case}</td>
                      <td className="px-3 py-2">
                        <PhraseText phrase={r.published} />
                        <span className="block text-xs text-stone-500">{r.source}</span>
                      </td>
                      <td className="px-3 py-2">
                        <PhraseText phrase={r.predicted} />
                        {r.ratio === null ? null : (
                          <span className="block text-xs text-stone-500">
                            {r.ratio}× the published figure
                          </span>
                        )}
                      </td>
                      <td className="px-3 py-2">
                        <span
                          className={
                            r.agrees ? 'font-medium text-leaf-700' : 'font-medium text-red-700'
                          }
                        >
                          {r.agrees ? 'agrees' : 'disagrees'}
                        </span>
                        <span className="block text-xs text-stone-500">{r.rule}</span>
                      </td>
                    </tr>
                  ))}
              </tbody>
            </table>
          </div>
        </section>
      ))}
    </div>
  );
}
