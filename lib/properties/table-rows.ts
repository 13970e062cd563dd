import { displayUnit, toDisplay, type UnitSystem } from '@/lib/units';
import type { RevisionValue, SourceRef } from './records';
import { formatValue } from './diff';
import { QUANTITY_KEYS, type Quantity } from './quantities';

/** One published value as the properties table shows it: the text, the number, its provenance. */
export interface TableValue {
  text: string;
  value: number;
  unit: string;
  variant: string;
  low: number | null;
  high: number | null;
  sd: number | null;
  isTypicalDefault: boolean;
  source: SourceRef | null;
  /** Labelled conditions ("Method", "Ripeness"…), only those the source gives. */
  conditions: [string, string][];
}

/** One cultivar per row, every quantity's published values in entry order (possibly none). */
export interface TableRow {
  slug: string;
  name: string;
  isType: boolean;
  commodity: { slug: string; name: string };
  revision: number | null;
  values: Record<Quantity, TableValue[]>;
}

/** The record fields `toTableRows` reads (the shape `listPublishedCultivars` returns). */
interface CultivarLike {
  slug: string;
  name: string;
  isType: boolean;
  commodity: { slug: string; name: string };
  published: { number: number } | null;
  values: RevisionValue[];
}

const CONDITION_LABELS = [
  ['method', 'Method'],
  ['ripeness', 'Ripeness'],
  ['temperature', 'Temperature'],
  ['storage', 'Storage'],
  ['loadingRate', 'Loading rate'],
  ['probe', 'Probe'],
  ['note', 'Note'],
] as const;

/** The conditions a value was measured under, labelled, skipping the ones not given. */
export function conditionsOf(v: RevisionValue): [string, string][] {
  const out: [string, string][] = CONDITION_LABELS.filter(([k]) => v[k]).map(([k, label]) => [
    label,
    String(v[k]),
  ]);
  if (v.samples !== null) out.splice(1, 0, ['Samples', `n = ${v.samples}`]);
  return out;
}

function tableValue(v: RevisionValue): TableValue {
  return {
    text: formatValue(v),
    value: v.value,
    unit: v.unit,
    variant: v.variant,
    low: v.low,
    high: v.high,
    sd: v.sd,
    isTypicalDefault: v.isTypicalDefault,
    source: v.source,
    conditions: conditionsOf(v),
  };
}

/** Plain, serialisable rows for the client table. */
export function toTableRows(cultivars: CultivarLike[]): TableRow[] {
  return cultivars.map((c) => {
    const values = Object.fromEntries(QUANTITY_KEYS.map((q) => [q, [] as TableValue[]]));
    for (const v of c.values) values[v.quantity].push(tableValue(v));
    return {
      slug: c.slug,
      name: c.name,
      isType: c.isType,
      commodity: { slug: c.commodity.slug, name: c.commodity.name },
      revision: c.published?.number ?? null,
      values: values as Record<Quantity, TableValue[]>,
    };
  });
}

/** The value a column sorts and range-filters by: the first published one, as the API's headline. */
export function headlineOf(row: TableRow, q: Quantity): number | undefined {
  return row.values[q][0]?.value;
}

/** Authors and year, the short form of a source ("Shahabasi, Y. 1979"). */
export function shortCitation(s: SourceRef | null): string {
  if (!s) return 'no source (typical default)';
  return [s.authors ?? s.title, s.year].filter(Boolean).join(' ');
}

/**
 * The range of several values of one quantity (one canonical unit) in the reader's units, e.g.
 * `1.9–3.1 MPa`, or `275.6–449.6 psi` in US units.
 */
export function rangeAcross(
  values: Pick<TableValue, 'value' | 'unit'>[],
  system: UnitSystem = 'si',
): string {
  const si = values[0]?.unit ?? '–';
  const numbers = values.map((v) => toDisplay(v.value, si, system));
  const n = (x: number) => String(Number(x.toPrecision(4)));
  const unit = !values.length || si === '–' ? '' : ` ${displayUnit(si, system)}`;
  return `${n(Math.min(...numbers))}–${n(Math.max(...numbers))}${unit}`;
}
