'use client';

import { useState } from 'react';
import { useUnits } from '@/components/units/units-provider';
import { parseNumberText, readerDecimalMark } from '@/lib/number-text';
import { QUANTITIES, QUANTITY_KEYS, isQuantity } from '@/lib/properties/quantities';
import type { TableQuery } from '@/lib/properties/table-query';
import { unitLabel } from '@/lib/properties/view-csv';
import { INPUT, LABEL } from './filter-styles';

type Range = TableQuery['range'];
type Ends = { min: number | null; max: number | null };

/**
 * The typed ends as numbers in the reader's units, or why the range cannot apply: both ends
 * optional, each one number ("20,5" reads 20.5), min ≤ max.
 */
function readEnds(min: string, max: string): Ends | { problem: string } {
  const mark = readerDecimalMark();
  const a = parseNumberText(min, mark);
  const b = parseNumberText(max, mark);
  if (!a.ok) return { problem: `At least: ${a.message}` };
  if (!b.ok) return { problem: `At most: ${b.message}` };
  if (a.value !== null && b.value !== null && a.value > b.value) {
    return { problem: 'The minimum is above the maximum; the range is not applied.' };
  }
  return { min: a.value, max: b.value };
}

/**
 * A min/max range on one quantity column, typed in the reader's units and applied to the stored
 * SI values (the address keeps SI, so a shared link means the same in either system). What is
 * typed is kept as typed; the range applies only when it makes sense, and otherwise the fields
 * say why beside them.
 */
export function RangeFilter({
  initial,
  onApply,
}: {
  initial: Range;
  onApply: (range: Range) => void;
}) {
  const units = useUnits();
  const si = (q: string) => (isQuantity(q) ? QUANTITIES[q].unit : '–');
  // An SI end from the address, in the reader's units to six significant figures.
  const shown = (n: number | null | undefined) =>
    n == null || !initial
      ? ''
      : String(Number(units.toDisplay(n, si(initial.column)).toPrecision(6)));
  const [column, setColumn] = useState<string>(initial?.column ?? '');
  const [min, setMin] = useState(shown(initial?.min));
  const [max, setMax] = useState(shown(initial?.max));
  const ends = readEnds(min, max);
  const problem = 'problem' in ends ? ends.problem : null;

  function applyRange(nextColumn: string, nextMin: string, nextMax: string) {
    setColumn(nextColumn);
    setMin(nextMin);
    setMax(nextMax);
    if (!isQuantity(nextColumn)) return onApply(null);
    const next = readEnds(nextMin, nextMax);
    if ('problem' in next) return;
    const toSI = (n: number | null) => (n === null ? null : units.fromDisplay(n, si(nextColumn)));
    onApply({ column: nextColumn, min: toSI(next.min), max: toSI(next.max) });
  }

  const unit = isQuantity(column) ? unitLabel(column, units.system) : '';
  return (
    <>
      <div className="col-span-2 space-y-1 lg:col-span-1">
        <label htmlFor="filter-range" className={LABEL}>
          Range on
        </label>
        <select
          id="filter-range"
          value={column}
          onChange={(e) => applyRange(e.target.value, min, max)}
          className={INPUT}
        >
          <option value="">No range</option>
          {QUANTITY_KEYS.map((q) => (
            <option key={q} value={q}>
              {QUANTITIES[q].label} ({unitLabel(q, units.system)})
            </option>
          ))}
        </select>
      </div>
      {(['min', 'max'] as const).map((end) => (
        <div key={end} className="min-w-0 space-y-1">
          <label htmlFor={`filter-${end}`} className={LABEL}>
            {end === 'min' ? 'At least' : 'At most'}
            {unit ? ` (${unit})` : ''}
          </label>
          <input
            id={`filter-${end}`}
            inputMode="decimal"
            value={end === 'min' ? min : max}
            disabled={!column}
            aria-invalid={problem ? true : undefined}
            aria-describedby="filter-range-problem"
            onChange={(e) =>
              end === 'min'
                ? applyRange(column, e.target.value, max)
                : applyRange(column, min, e.target.value)
            }
            className={`num ${INPUT}`}
          />
        </div>
      ))}
      <p
        id="filter-range-problem"
        aria-live="polite"
        className="col-span-2 text-xs text-red-700 empty:hidden lg:col-span-5"
      >
        {problem ?? ''}
      </p>
    </>
  );
}
