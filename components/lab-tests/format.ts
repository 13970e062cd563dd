import { formatDate } from '@/lib/dates';
import type { SampleGeometry } from '@/lib/lab-tests/fit';

/** A measured figure to n significant digits, without trailing zeros. */
export const sig = (x: number, n = 3) => String(Number(x.toPrecision(n)));

export const rangeText = (fromMm: number, toMm: number) => `${sig(fromMm)}–${sig(toMm)} mm`;

export function geometryText(g: SampleGeometry): string {
  return g.kind === 'sphere'
    ? `diameter ${sig(g.diameterMm)} mm`
    : `radii ${sig(g.radiiMm[0])} mm and ${sig(g.radiiMm[1])} mm`;
}

export const dateText = (iso: string) => formatDate(iso);
