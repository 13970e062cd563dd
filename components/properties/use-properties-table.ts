'use client';

import { useEffect, type Dispatch, type SetStateAction } from 'react';
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
import { QUANTITY_KEYS } from '@/lib/properties/quantities';
import { tableQueryString, type SortColumn, type TableQuery } from '@/lib/properties/table-query';
import type { TableRow } from '@/lib/properties/table-rows';
import { COLUMNS, nameMatches } from './table-columns';

const resolve = <T>(u: Updater<T>, old: T): T =>
  typeof u === 'function' ? (u as (x: T) => T)(old) : u;

function filtersOf(view: TableQuery): ColumnFiltersState {
  const out: ColumnFiltersState = [];
  if (view.commodity) out.push({ id: 'commodity', value: view.commodity });
  if (view.range) out.push({ id: view.range.column, value: [view.range.min, view.range.max] });
  return out;
}

/**
 * TanStack Table driven by one view object: sorting, filters, columns and page are derived from
 * it, and the table's own sort and page changes are written back into it.
 */
export function usePropertiesTable(
  rows: TableRow[],
  view: TableQuery,
  setView: Dispatch<SetStateAction<TableQuery>>,
) {
  const sorting: SortingState = view.sort ? [view.sort] : [];
  const pagination: PaginationState = { pageIndex: view.pageIndex, pageSize: view.pageSize };
  // TanStack Table is the table engine here; the React Compiler (which this warns for) is off.
  // eslint-disable-next-line react-hooks/incompatible-library
  return useReactTable({
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
}

/** Keep the view in the address (replaceState: no history entry per keystroke). */
export function useViewInAddress(view: TableQuery) {
  useEffect(() => {
    const url = window.location.pathname + tableQueryString(view);
    if (url !== window.location.pathname + window.location.search) {
      window.history.replaceState(null, '', url);
    }
  }, [view]);
}
