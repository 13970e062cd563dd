import { displayUnit, toDisplay, type UnitSystem } from '@/lib/units';

// A number with an SI unit inside a source's words ("62 mm/min", "8 mm cylindrical probe").
const MEASURE = /(\d+(?:\.\d+)?)\s?(mm\/min|mm\/s|mm|kPa|MPa|kg\/m³|N|g|J|°C)(?![\w/³²·])/g;

const fig = (x: number) => String(Number(x.toPrecision(3)));

function converted(value: number, unit: string, system: UnitSystem): string {
  // Celsius has an offset, so it is not a factor of lib/units (°F = °C × 9/5 + 32, exact).
  if (unit === '°C') return `${fig((value * 9) / 5 + 32)} °F`;
  const rate = unit.match(/^mm\/(min|s)$/);
  if (rate) return `${fig(toDisplay(value, 'mm', system))} in/${rate[1]}`;
  return `${fig(toDisplay(value, unit, system))} ${displayUnit(unit, system)}`;
}

/**
 * The conditions that state one measure (a probe, a rate, a temperature) and are shown in the
 * reader's units. Method, ripeness, storage and notes are prose, quoted as written: a note may
 * carry its own arithmetic ("14 in × 25.4 = 355.6 mm") that a conversion would garble.
 */
export const MEASURED_CONDITIONS: readonly string[] = ['Temperature', 'Loading rate', 'Probe'];

/**
 * A condition as the source words it, with each measure in it shown in the reader's units
 * ("62 mm/min" → "2.44 in/min", "20 °C" → "68 °F"); a text that already gives °F keeps its °C.
 * SI readers get the text unchanged.
 */
export function conditionIn(text: string, system: UnitSystem): string {
  if (system === 'si') return text;
  const hasF = text.includes('°F');
  return text.replace(MEASURE, (whole, n: string, unit: string) =>
    unit === '°C' && hasF ? whole : converted(Number(n), unit, system),
  );
}
