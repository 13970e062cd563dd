'use client';

import { useSearchParams } from 'next/navigation';
import { useEffect, useState } from 'react';
import {
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type PaginationState,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { QUANTITY_KEYS, isQuantity } from '@/lib/properties/quantities';
import {
  parseTableQuery,
  tableQueryString,
  type SortColumn,
  type TableQuery,
} from '@/lib/properties/table-query';
import type { TableRow } from '@/lib/properties/table-rows';
import { viewCsv } from '@/lib/properties/view-csv';
import { ColumnPicker } from './column-picker';
import { COLUMNS, nameMatches } from './table-columns';
import { TableFilters } from './table-filters';
import { TableGrid } from './table-grid';
import { TablePager } from './table-pager';

const resolve = <T,>(u: Updater<T>, old: T): T =>
  typeof u === 'function' ? (u as (x: T) => T)(old) : u;

function filtersOf(view: TableQuery): ColumnFiltersState {
  const out: ColumnFiltersState = [];
  if (view.commodity) out.push({ id: 'commodity', value: view.commodity });
  if (view.range) out.push({ id: view.range.column, value: [view.range.min, view.range.max] });
  return out;
}

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
  const [view, setView] = useState(() => parseTableQuery(params));
  const sorting: SortingState = view.sort ? [view.sort] : [];
  const pagination: PaginationState = { pageIndex: view.pageIndex, pageSize: view.pageSize };

  // TanStack Table is the table engine here; the React Compiler (which this warns for) is off.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns: COLUMNS,
    state: {
      sorting,
      pagination,
      globalFilter: view.q,
      columnFilters: filtersOf(view),
      columnVisibility: Object.fromEntries(QUANTITY_KEYS.map((q) => [q, view.columns.includes(q)])),
    },
    onSortingChange: (u) => {
      const [next] = resolve(u, sorting);
      const sort = next ? { id: next.id as SortColumn, desc: next.desc } : null;
      setView((v) => ({ ...v, sort, pageIndex: 0 }));
    },
    onPaginationChange: (u) => setView((v) => ({ ...v, ...resolve(u, pagination) })),
    globalFilterFn: nameMatches,
    enableMultiSort: false,
    autoResetPageIndex: false,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });

  const matching = table.getPrePaginationRowModel().rows;
  const lastPage = Math.max(0, table.getPageCount() - 1);
  useEffect(() => {
    if (view.pageIndex > lastPage) setView((v) => ({ ...v, pageIndex: lastPage }));
  }, [view.pageIndex, lastPage]);
  useEffect(() => {
    const url = window.location.pathname + tableQueryString(view);
    if (url !== window.location.pathname + window.location.search) {
      window.history.replaceState(null, '', url);
    }
  }, [view]);

  const shownColumns = table
    .getVisibleLeafColumns()
    .map((c) => c.id)
    .filter(isQuantity);
  const exportView = () =>
    download(
      viewCsv(
        matching.map((r) => r.original),
        shownColumns,
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
