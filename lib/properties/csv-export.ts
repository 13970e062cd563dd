import type { CultivarRecord } from './records';
import { toCsv } from '@/lib/csv';
import { conditionIn } from './condition-units';
import { displayUnit, toDisplay, type UnitSystem } from '@/lib/units';
import { QUANTITIES, type Quantity } from './quantities';

/**
 * One row per published value, with unit, spread, conditions and source in their own columns;
 * value, spread and unit in the reader's system.
 */
export function cultivarsCsv(cultivars: CultivarRecord[], system: UnitSystem = 'si'): string {
  const shown = (x: number | null, unit: string) =>
    x === null ? null : toDisplay(x, unit, system);
  const header = [
    'commodity',
    'cultivar',
    'revision',
    'quantity',
    'variant',
    'value',
    'unit',
    'low',
    'high',
    'sd',
    'samples',
    'method',
    'ripeness',
    'temperature',
    'storage',
    'typical_default',
    'source_key',
    'source',
  ];
  const rows = cultivars.flatMap((c) =>
    c.values.map((v) => [
      c.commodity.name,
      c.name,
      c.published?.number ?? null,
      QUANTITIES[v.quantity as Quantity].label,
      conditionIn(v.variant, system),
      shown(v.value, v.unit),
      displayUnit(v.unit, system),
      shown(v.low, v.unit),
      shown(v.high, v.unit),
      shown(v.sd, v.unit),
      v.samples,
      v.method,
      v.ripeness,
      v.temperature,
      v.storage,
      v.isTypicalDefault ? 'yes' : 'no',
      v.source?.key ?? null,
      v.source
        ? [v.source.authors, v.source.year, v.source.title].filter(Boolean).join(', ')
        : null,
    ]),
  );
  return toCsv(header, rows);
}
