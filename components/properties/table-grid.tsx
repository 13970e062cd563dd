'use client';

import { flexRender, type Header, type Table } from '@tanstack/react-table';
import type { TableRow } from '@/lib/properties/table-rows';

const ARIA_SORT = { asc: 'ascending', desc: 'descending' } as const;
const ARROW = { asc: '↑', desc: '↓' } as const;
const STICKY = 'sticky left-0 z-10 bg-white';

function HeaderCell({ header }: { header: Header<TableRow, unknown> }) {
  const sorted = header.column.getIsSorted();
  const sticky = header.column.id === 'name';
  return (
    <th
      scope="col"
      aria-sort={sorted ? ARIA_SORT[sorted] : 'none'}
      className={`border-b border-stone-200 bg-stone-100 px-3 py-2 text-left align-bottom text-xs font-semibold text-stone-700 ${sticky ? 'sticky left-0 z-10' : 'min-w-36'}`}
    >
      <button
        type="button"
        onClick={header.column.getToggleSortingHandler()}
        className="inline-flex items-end gap-1 rounded text-left hover:text-leaf-700 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600"
        data-testid={`sort-${header.column.id}`}
      >
        <span>{flexRender(header.column.columnDef.header, header.getContext())}</span>
        <span aria-hidden="true" className="w-3 text-leaf-700">
          {sorted ? ARROW[sorted] : ''}
        </span>
        <span className="sr-only">
          {sorted ? `, sorted ${ARIA_SORT[sorted]}` : ''}, press to change the sort
        </span>
      </button>
    </th>
  );
}

/**
 * The table itself, scrolling sideways inside its own box with the cultivar column pinned. The
 * box is positioned so the cells' visually hidden (absolute) texts stay inside it on a phone.
 */
export function TableGrid({ table }: { table: Table<TableRow> }) {
  const rows = table.getRowModel().rows;
  return (
    <div className="relative max-w-full overflow-x-auto rounded-lg border border-stone-200 bg-white">
      <table
        className="w-full border-separate border-spacing-0 text-sm"
        data-testid="properties-table"
      >
        <caption className="sr-only">
          Published property values, one cultivar a row. Each value is a button: focus or hover it
          for its source and conditions.
        </caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((h) => (
                <HeaderCell key={h.id} header={h} />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} data-testid="property-row" data-slug={row.original.slug}>
              {row.getVisibleCells().map((cell) => (
                <td
                  key={cell.id}
                  data-column={cell.column.id}
                  className={`border-b border-stone-100 px-3 py-2 align-top ${cell.column.id === 'name' ? `${STICKY} min-w-32` : ''}`}
                >
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
          {rows.length === 0 ? (
            <tr>
              <td
                colSpan={table.getVisibleLeafColumns().length}
                className="px-3 py-6 text-center text-stone-600"
              >
                No cultivar matches these filters. Clear the text or widen the range.
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </div>
  );
}
