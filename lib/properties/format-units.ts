import { displayUnit, toDisplay, type UnitSystem } from '@/lib/units';

interface Spread {
  value: number;
  unit: string;
  low: number | null;
  high: number | null;
  sd: number | null;
}

/** A stored (SI) value with its spread as text in the reader's units, e.g. `0.35 psi (0.2–0.5)`. */
export function formatValueIn(v: Spread, system: UnitSystem): string {
  const unit = displayUnit(v.unit, system);
  const shown = (x: number) => String(Number(toDisplay(x, v.unit, system).toPrecision(4)));
  const spread =
    v.low !== null && v.high !== null
      ? ` (${shown(v.low)}–${shown(v.high)})`
      : v.sd !== null
        ? ` ± ${shown(v.sd)}`
        : '';
  return `${shown(v.value)}${unit === '–' ? '' : ` ${unit}`}${spread}`;
}
