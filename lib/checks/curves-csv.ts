import { toCsv } from '@/lib/csv';
import type { CheckReport } from './report';

/** A saved check's curves as CSV: one column per quantity, each header naming its unit. */
export function curvesCsv(curves: CheckReport['curves']): string {
  return toCsv(curves.columns, curves.rows);
}
