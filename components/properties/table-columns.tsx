import Link from 'next/link';
import { createColumnHelper, type FilterFn } from '@tanstack/react-table';
import { QUANTITIES, QUANTITY_KEYS } from '@/lib/properties/quantities';
import { headlineOf, type TableRow } from '@/lib/properties/table-rows';
import { UnitLabel } from './unit-label';
import { ValueCell } from './value-cell';

const column = createColumnHelper<TableRow>();

/** A row passes when the column's first value lies in [min, max]; a missing value never does. */
export const inRange: FilterFn<TableRow> = (row, id, range: [number | null, number | null]) => {
  const v = row.getValue<number | undefined>(id);
  if (v === undefined) return false;
  const [min, max] = range;
  return (min === null || v >= min) && (max === null || v <= max);
};

/** The text filter: cultivar or commodity name, ignoring case. */
export const nameMatches: FilterFn<TableRow> = (row, _id, text: string) => {
  const needle = text.trim().toLowerCase();
  const r = row.original;
  return !needle || `${r.name}\u0000${r.commodity.name}`.toLowerCase().includes(needle);
};

export const COLUMNS = [
  column.accessor('name', {
    id: 'name',
    header: () => 'Cultivar',
    enableHiding: false,
    sortDescFirst: false,
    cell: ({ row }) => (
      <Link
        href={`/properties/${row.original.slug}`}
        className="font-medium text-leaf-700 underline decoration-leaf-100 underline-offset-4 hover:decoration-leaf-700"
      >
        {row.original.name}
      </Link>
    ),
  }),
  column.accessor((r) => r.commodity.name, {
    id: 'commodity',
    header: () => 'Commodity',
    enableHiding: false,
    sortDescFirst: false,
    filterFn: (row, _id, slug: string) => row.original.commodity.slug === slug,
  }),
  ...QUANTITY_KEYS.map((q) =>
    column.accessor((r) => headlineOf(r, q), {
      id: q,
      header: () => (
        <>
          {QUANTITIES[q].label}{' '}
          <span className="font-normal text-stone-500">
            (<UnitLabel q={q} />)
          </span>
        </>
      ),
      sortDescFirst: false,
      sortUndefined: 'last',
      filterFn: inRange,
      enableGlobalFilter: false,
      cell: ({ row }) => <ValueCell row={row.original} quantity={q} />,
    }),
  ),
];
