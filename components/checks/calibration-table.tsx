'use client';

import { useUnits } from '@/components/units/units-provider';
import type { CalibrationRow, Phrase } from '@/lib/checks/calibration';

function PhraseText({ phrase }: { phrase: Phrase }) {
  const u = useUnits();
  return <>{phrase.map((p) => (typeof p === 'string' ? p : u.show(p.value, p.unit))).join('')}</>;
}

/** The agreement in words, shaded too (the words carry it, not the colour). */
function Agreement({ row }: { row: CalibrationRow }) {
  return (
    <span className={row.agrees ? 'font-medium text-leaf-700' : 'font-medium text-red-700'}>
      {row.agrees ? 'agrees' : 'disagrees'}
    </span>
  );
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
          {/* Phones: one card per row, the agreement beside the case. */}
          <ul className="space-y-2 sm:hidden">
            {rows
              .filter((r) => r.check === c)
              .map((r, i) => (
                <li key={i} className="rounded-lg border border-stone-200 bg-white p-3 text-sm">
                  <p className="flex items-start justify-between gap-2">
                    <span className="font-medium">{r.case}</span>
                    <Agreement row={r} />
                  </p>
                  <p className="mt-1">
                    <span className="text-stone-500">Published: </span>
                    <PhraseText phrase={r.published} />{' '}
                    <span className="text-xs text-stone-500">({r.source})</span>
                  </p>
                  <p className="mt-1">
                    <span className="text-stone-500">The check predicts: </span>
                    <PhraseText phrase={r.predicted} />
                    {r.ratio === null ? null : (
                      <span className="text-xs text-stone-500">
                        {' '}
                        — {r.ratio}× the published figure
                      </span>
                    )}
                  </p>
                  <p className="mt-1 text-xs text-stone-500">Judged: {r.rule}</p>
                </li>
              ))}
          </ul>
          <div className="hidden overflow-x-auto rounded-lg border border-stone-200 bg-white sm:block">
            <table className="w-full text-left text-sm">
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
                        <Agreement row={r} />
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
