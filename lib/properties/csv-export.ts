import type { CultivarRecord } from './records';
import { toCsv } from '@/lib/csv';
import { QUANTITIES, type Quantity } from './quantities';

/** One row per published value, with unit, spread, conditions and source in their own columns. */
export function cultivarsCsv(cultivars: CultivarRecord[]): string {
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
      v.variant,
      v.value,
      v.unit,
      v.low,
      v.high,
      v.sd,
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
