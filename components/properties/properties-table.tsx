'use client';

import { useSearchParams } from 'next/navigation';
import { useState } from 'react';
import { isQuantity } from '@/lib/properties/quantities';
import { parseTableQuery } from '@/lib/properties/table-query';
import type { TableRow } from '@/lib/properties/table-rows';
import { viewCsv } from '@/lib/properties/view-csv';
import { useUnits } from '@/components/units/units-provider';
import { ColumnPicker } from './column-picker';
import { TableFilters } from './table-filters';
import { TableGrid } from './table-grid';
import { TablePager } from './table-pager';
import { usePropertiesTable, useViewInAddress } from './use-properties-table';

function download(csv: string) {
  // The byte-order mark lets spreadsheets read the file as UTF-8 (en dashes, kg/m³).
  const url = URL.createObjectURL(new Blob(['\uFEFF', csv], { type: 'text/csv;charset=utf-8' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = 'tenderline-properties-view.csv';
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/**
 * The published properties, one cultivar a row. The view (sort, filters, columns, page) is one
 * state object mirrored into the address with replaceState, so a reload or a shared link opens
 * the same view; TanStack Table does the sorting, filtering and paging.
 */
export function PropertiesTable({ rows }: { rows: TableRow[] }) {
  // Read from the address itself (not the server's first answer), so going Back to the page
  // restores the view as it was last left.
  const params = useSearchParams();
  const { system } = useUnits();
  const [view, setView] = useState(() => parseTableQuery(params));
  const table = usePropertiesTable(rows, view, setView);
  useViewInAddress(view);

  const matching = table.getPrePaginationRowModel().rows;
  const lastPage = Math.max(0, table.getPageCount() - 1);
  // A page past the end (an old link, a narrower filter) moves to the last page, during render.
  if (view.pageIndex > lastPage) setView((v) => ({ ...v, pageIndex: lastPage }));

  const shownColumns = table
    .getVisibleLeafColumns()
    .map((c) => c.id)
    .filter(isQuantity);
  const exportView = () =>
    download(
      viewCsv(
        matching.map((r) => r.original),
        shownColumns,
        system,
      ),
    );

  return (
    <div className="space-y-4">
      <TableFilters rows={rows} view={view} onChange={setView} />
      <div className="flex flex-wrap items-center gap-3">
        <ColumnPicker view={view} onChange={setView} />
        <button
          type="button"
          onClick={exportView}
          className="rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium text-stone-800 hover:bg-stone-100 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600"
        >
          Export this view as CSV
        </button>
        <p className="text-sm text-stone-600" aria-live="polite" data-testid="match-count">
          <span className="num">{matching.length}</span> of{' '}
          <span className="num">{rows.length}</span> cultivars match; the export holds all of them,
          sorted as shown, with the shown columns.
        </p>
      </div>
      <p className="text-xs text-stone-500 sm:hidden">
        The table scrolls sideways for more columns.
      </p>
      <TableGrid table={table} />
      <TablePager table={table} />
    </div>
  );
}
