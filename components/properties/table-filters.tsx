'use client';

import type { Dispatch, SetStateAction } from 'react';
import type { TableQuery } from '@/lib/properties/table-query';
import type { TableRow } from '@/lib/properties/table-rows';
import { INPUT, LABEL } from './filter-styles';
import { RangeFilter } from './range-filter';

type Props = { rows: TableRow[]; view: TableQuery; onChange: Dispatch<SetStateAction<TableQuery>> };

function commoditiesOf(rows: TableRow[]) {
  const bySlug = new Map(rows.map((r) => [r.commodity.slug, r.commodity.name]));
  return [...bySlug].sort((a, b) => a[1].localeCompare(b[1]));
}

/** Text, commodity and range filters; each change goes back to the first page. */
export function TableFilters({ rows, view, onChange }: Props) {
  const set = (patch: Partial<TableQuery>) => onChange((v) => ({ ...v, ...patch, pageIndex: 0 }));

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
      <RangeFilter initial={view.range} onApply={(range) => set({ range })} />
      <p className="col-span-2 text-xs text-stone-500 lg:col-span-5">
        Sorting and the range use each cultivar&rsquo;s first listed value of the quantity; a
        cultivar with no published value there is left out of a range and sorted last.
      </p>
    </div>
  );
}
