'use client';

import type { Dispatch, SetStateAction } from 'react';
import { QUANTITIES, QUANTITY_KEYS, type Quantity } from '@/lib/properties/quantities';
import type { TableQuery } from '@/lib/properties/table-query';
import { UnitLabel } from './unit-label';

type Props = { view: TableQuery; onChange: Dispatch<SetStateAction<TableQuery>> };

/** Which quantities the table shows, kept in the catalogue's order whatever the click order. */
export function ColumnPicker({ view, onChange }: Props) {
  const toggle = (q: Quantity, on: boolean) =>
    onChange((v) => ({
      ...v,
      columns: QUANTITY_KEYS.filter((k) => (k === q ? on : v.columns.includes(k))),
    }));
  return (
    <details className="group relative">
      <summary className="cursor-pointer list-none rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium text-stone-800 hover:bg-stone-100 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600">
        Columns{' '}
        <span className="num text-stone-500">
          ({view.columns.length} of {QUANTITY_KEYS.length})
        </span>
      </summary>
      <fieldset className="absolute left-0 z-20 mt-1 w-80 max-w-[calc(100vw-2rem)] space-y-1 rounded-md border border-stone-300 bg-white p-3 shadow-lg">
        <legend className="sr-only">Quantities shown as columns</legend>
        {QUANTITY_KEYS.map((q) => (
          <label key={q} className="flex items-start gap-2 text-sm text-stone-800">
            <input
              type="checkbox"
              checked={view.columns.includes(q)}
              onChange={(e) => toggle(q, e.target.checked)}
              className="mt-0.5 accent-leaf-700"
            />
            <span>
              {QUANTITIES[q].label}{' '}
              <span className="text-stone-500">
                (<UnitLabel q={q} />)
              </span>
            </span>
          </label>
        ))}
      </fieldset>
    </details>
  );
}
