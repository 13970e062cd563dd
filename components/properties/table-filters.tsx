'use client';

import { useState, type Dispatch, type SetStateAction } from 'react';
import { QUANTITIES, QUANTITY_KEYS, isQuantity } from '@/lib/properties/quantities';
import type { TableQuery } from '@/lib/properties/table-query';
import type { TableRow } from '@/lib/properties/table-rows';
import { unitLabel } from '@/lib/properties/view-csv';

const INPUT =
  'block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500 disabled:bg-stone-100';
const LABEL = 'block text-sm font-medium text-stone-800';

type Props = { rows: TableRow[]; view: TableQuery; onChange: Dispatch<SetStateAction<TableQuery>> };

function commoditiesOf(rows: TableRow[]) {
  const bySlug = new Map(rows.map((r) => [r.commodity.slug, r.commodity.name]));
  return [...bySlug].sort((a, b) => a[1].localeCompare(b[1]));
}

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

/** Text, commodity and range filters; each change goes back to the first page. */
export function TableFilters({ rows, view, onChange }: Props) {
  const [column, setColumn] = useState<string>(view.range?.column ?? '');
  const [min, setMin] = useState(numberText(view.range?.min));
  const [max, setMax] = useState(numberText(view.range?.max));
  const problem = rangeProblem(min, max);
  const set = (patch: Partial<TableQuery>) => onChange((v) => ({ ...v, ...patch, pageIndex: 0 }));

  function applyRange(nextColumn: string, nextMin: string, nextMax: string) {
    setColumn(nextColumn);
    setMin(nextMin);
    setMax(nextMax);
    if (!isQuantity(nextColumn)) return set({ range: null });
    if (rangeProblem(nextMin, nextMax)) return;
    const n = (t: string) => (t.trim() === '' ? null : Number(t));
    set({ range: { column: nextColumn, min: n(nextMin), max: n(nextMax) } });
  }

  const unit = isQuantity(column) ? unitLabel(column) : '';
  return (
    <div className="grid grid-cols-2 gap-3 rounded-lg border border-stone-200 bg-white p-3 lg:grid-cols-[1.2fr_1fr_1.3fr_0.7fr_0.7fr]">
      <div className="col-span-2 space-y-1 sm:col-span-1">
        <label htmlFor="filter-q" className={LABEL}>
          Cultivar or commodity
        </label>
        <input
          id="filter-q"
          type="search"
          value={view.q}
          maxLength={100}
          placeholder="e.g. Jonathan"
          onChange={(e) => set({ q: e.target.value })}
          className={INPUT}
        />
      </div>
      <div className="col-span-2 space-y-1 sm:col-span-1">
        <label htmlFor="filter-commodity" className={LABEL}>
          Commodity
        </label>
        <select
          id="filter-commodity"
          value={view.commodity ?? ''}
          onChange={(e) => set({ commodity: e.target.value || null })}
          className={INPUT}
        >
          <option value="">All commodities</option>
          {commoditiesOf(rows).map(([slug, name]) => (
            <option key={slug} value={slug}>
              {name}
            </option>
          ))}
        </select>
      </div>
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
      <p className="col-span-2 text-xs text-stone-500 lg:col-span-5">
        Sorting and the range use each cultivar&rsquo;s first listed value of the quantity; a
        cultivar with no published value there is left out of a range and sorted last.
      </p>
    </div>
  );
}
