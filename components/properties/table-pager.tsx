'use client';

import type { Table } from '@tanstack/react-table';
import { PAGE_SIZES } from '@/lib/properties/table-query';
import type { TableRow } from '@/lib/properties/table-rows';

const BUTTON =
  'rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium text-stone-800 hover:bg-stone-100 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600 disabled:cursor-not-allowed disabled:bg-stone-100 disabled:text-stone-400';

/** Previous / next, where we are, and how many rows a page holds. */
export function TablePager({ table }: { table: Table<TableRow> }) {
  const { pageIndex, pageSize } = table.getState().pagination;
  const total = table.getPrePaginationRowModel().rows.length;
  const pages = Math.max(1, table.getPageCount());
  const first = total ? pageIndex * pageSize + 1 : 0;
  const last = Math.min(total, (pageIndex + 1) * pageSize);
  const sizes = [...new Set([...PAGE_SIZES, pageSize])].sort((a, b) => a - b);
  return (
    <nav aria-label="Table pages" className="flex flex-wrap items-center gap-3 text-sm">
      <p
        aria-live="polite"
        data-testid="page-status"
        className="basis-full text-stone-700 sm:basis-auto"
      >
        Page <span className="num">{Math.min(pageIndex + 1, pages)}</span> of{' '}
        <span className="num">{pages}</span> · rows <span className="num">{first}</span>–
        <span className="num">{last}</span> of <span className="num">{total}</span>
      </p>
      <div className="flex gap-2">
        <button
          type="button"
          className={BUTTON}
          onClick={() => table.previousPage()}
          disabled={!table.getCanPreviousPage()}
        >
          Previous page
        </button>
        <button
          type="button"
          className={BUTTON}
          onClick={() => table.nextPage()}
          disabled={!table.getCanNextPage()}
        >
          Next page
        </button>
      </div>
      <label className="flex items-center gap-2 text-stone-700">
        Rows a page
        <select
          value={pageSize}
          onChange={(e) => table.setPagination({ pageIndex: 0, pageSize: Number(e.target.value) })}
          className="num rounded-md border border-stone-300 bg-white px-2 py-1 text-sm"
        >
          {sizes.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </label>
    </nav>
  );
}
