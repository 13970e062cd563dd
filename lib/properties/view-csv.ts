import { toCsv, type CsvCell } from '@/lib/csv';
import { displayUnit, toDisplay, type UnitSystem } from '@/lib/units';
import { keyOf } from './api-shape';
import { conditionIn } from './condition-units';
import { formatValueIn } from './format-units';
import { QUANTITIES, variantsOf, type Quantity } from './quantities';
import { shortCitation, type TableRow, type TableValue } from './table-rows';

const hasKinds = (q: Quantity) => variantsOf(q).some((v) => v !== '');

/** A column key in the reader's units: `youngs_modulus_mpa`, or `youngs_modulus_psi` in US units. */
export function keyIn(q: Quantity, system: UnitSystem): string {
  const unit = QUANTITIES[q].unit;
  const shown = displayUnit(unit, system);
  if (shown === unit) return keyOf(q);
  return `${q}_${shown
    .replace(/³/g, '3')
    .replace(/[^A-Za-z0-9]+/g, '_')
    .toLowerCase()}`;
}

function headerOf(q: Quantity, system: UnitSystem): string[] {
  return [
    keyIn(q, system),
    ...(hasKinds(q) ? [`${q}_kind`] : []),
    `${q}_low`,
    `${q}_high`,
    `${q}_sd`,
    `${q}_source`,
    `${q}_more_values`,
  ];
}

const described = (v: TableValue, system: UnitSystem) =>
  `${formatValueIn(v, system)}${v.variant ? ` ${conditionIn(v.variant, system)}` : ''}, ${shortCitation(v.source)}`;

function cellsOf(row: TableRow, q: Quantity, system: UnitSystem): CsvCell[] {
  const [first, ...more] = row.values[q];
  const shown = (x: number | null | undefined) =>
    x == null || !first ? x : toDisplay(x, first.unit, system);
  return [
    shown(first?.value),
    ...(hasKinds(q) ? [first?.variant ? conditionIn(first.variant, system) : null] : []),
    shown(first?.low),
    shown(first?.high),
    shown(first?.sd),
    first ? shortCitation(first.source) : null,
    more.map((v) => described(v, system)).join('; ') || null,
  ];
}

/**
 * The table as it is shown (these rows, in this order, these columns) as CSV: per quantity the
 * first value as a number in the unit its column names (the reader's), its spread and source, and
 * any further values as text. Text cells are made formula-safe by `toCsv`.
 */
export function viewCsv(rows: TableRow[], columns: Quantity[], system: UnitSystem = 'si'): string {
  const header = [
    'commodity',
    'cultivar',
    'slug',
    'revision',
    ...columns.flatMap((q) => headerOf(q, system)),
  ];
  const body = rows.map((r) => [
    r.commodity.name,
    r.name,
    r.slug,
    r.revision,
    ...columns.flatMap((q) => cellsOf(r, q, system)),
  ]);
  return toCsv(header, body);
}

/** The column heading's unit in the reader's system, in words where the quantity has none. */
export function unitLabel(q: Quantity, system: UnitSystem = 'si'): string {
  const unit = QUANTITIES[q].unit;
  return unit === '–' ? 'no unit' : displayUnit(unit, system);
}
