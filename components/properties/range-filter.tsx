'use client';

import { useState } from 'react';
import { QUANTITIES, QUANTITY_KEYS, isQuantity } from '@/lib/properties/quantities';
import type { TableQuery } from '@/lib/properties/table-query';
import { unitLabel } from '@/lib/properties/view-csv';
import { INPUT, LABEL } from './filter-styles';

const numberText = (n: number | null | undefined) => (n == null ? '' : String(n));

/** Why a typed range cannot apply, or null: both ends optional, each a number, min ≤ max. */
function rangeProblem(min: string, max: string): string | null {
  const bad = (t: string) => t.trim() !== '' && !Number.isFinite(Number(t));
  if (bad(min) || bad(max)) return 'Type a number, or leave the end empty.';
  if (min.trim() && max.trim() && Number(min) > Number(max)) {
    return 'The minimum is above the maximum; the range is not applied.';
  }
  return null;
}

type Range = TableQuery['range'];

/**
 * A min/max range on one quantity column. What is typed is kept as typed; the range applies
 * only when it makes sense, and otherwise the fields say why beside them.
 */
export function RangeFilter({
  initial,
  onApply,
}: {
  initial: Range;
  onApply: (range: Range) => void;
}) {
  const [column, setColumn] = useState<string>(initial?.column ?? '');
  const [min, setMin] = useState(numberText(initial?.min));
  const [max, setMax] = useState(numberText(initial?.max));
  const problem = rangeProblem(min, max);

  function applyRange(nextColumn: string, nextMin: string, nextMax: string) {
    setColumn(nextColumn);
    setMin(nextMin);
    setMax(nextMax);
    if (!isQuantity(nextColumn)) return onApply(null);
    if (rangeProblem(nextMin, nextMax)) return;
    const n = (t: string) => (t.trim() === '' ? null : Number(t));
    onApply({ column: nextColumn, min: n(nextMin), max: n(nextMax) });
  }

  const unit = isQuantity(column) ? unitLabel(column) : '';
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
              {QUANTITIES[q].label} ({unitLabel(q)})
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
