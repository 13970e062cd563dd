import { toCsv, type CsvCell } from '@/lib/csv';
import { keyOf } from './api-shape';
import { QUANTITIES, variantsOf, type Quantity } from './quantities';
import { shortCitation, type TableRow, type TableValue } from './table-rows';

const hasKinds = (q: Quantity) => variantsOf(q).some((v) => v !== '');

function headerOf(q: Quantity): string[] {
  return [
    keyOf(q),
    ...(hasKinds(q) ? [`${q}_kind`] : []),
    `${q}_low`,
    `${q}_high`,
    `${q}_sd`,
    `${q}_source`,
    `${q}_more_values`,
  ];
}

const described = (v: TableValue) =>
  `${v.text}${v.variant ? ` ${v.variant}` : ''}, ${shortCitation(v.source)}`;

function cellsOf(row: TableRow, q: Quantity): CsvCell[] {
  const [first, ...more] = row.values[q];
  return [
    first?.value,
    ...(hasKinds(q) ? [first?.variant || null] : []),
    first?.low,
    first?.high,
    first?.sd,
    first ? shortCitation(first.source) : null,
    more.map(described).join('; ') || null,
  ];
}

/**
 * The table as it is shown (these rows, in this order, these columns) as CSV: per quantity the
 * first value as a number in the unit its column names, its spread and source, and any further
 * values as text. Text cells are made formula-safe by `toCsv`.
 */
export function viewCsv(rows: TableRow[], columns: Quantity[]): string {
  const header = ['commodity', 'cultivar', 'slug', 'revision', ...columns.flatMap(headerOf)];
  const body = rows.map((r) => [
    r.commodity.name,
    r.name,
    r.slug,
    r.revision,
    ...columns.flatMap((q) => cellsOf(r, q)),
  ]);
  return toCsv(header, body);
}

/** The column heading's unit, in words where the quantity has none. */
export function unitLabel(q: Quantity): string {
  const unit = QUANTITIES[q].unit;
  return unit === '–' ? 'no unit' : unit;
}
