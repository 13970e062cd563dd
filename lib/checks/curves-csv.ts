import { toCsv, type CsvCell } from '@/lib/csv';

/** The curves of a saved check (its `series`), one column per key; keys name their units. */
export function curvesCsv(results: { series?: Record<string, number | null>[] }): string {
  const series = results.series ?? [];
  const keys = series.length ? Object.keys(series[0]) : [];
  return toCsv(
    keys,
    series.map((row) => keys.map((k) => row[k] as CsvCell)),
  );
}
