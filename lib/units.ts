/**
 * Display units. Values are stored and computed in SI; a user may read and type them in US
 * customary units instead. Factors from the exact definitions of the inch (25.4 mm) and the
 * avoirdupois pound (0.45359237 kg) with standard gravity 9.80665 m/s² (NIST Special
 * Publication 811, 2008, Appendix B).
 */
export const UNIT_SYSTEMS = ['si', 'us'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

const LB_KG = 0.45359237;
const IN_M = 0.0254;
const LBF_N = LB_KG * 9.80665;

/** SI unit → its US customary display unit and how many SI units one of it is. */
const US: Record<string, { unit: string; factor: number }> = {
  mm: { unit: 'in', factor: 25.4 },
  m: { unit: 'ft', factor: 12 * IN_M },
  g: { unit: 'oz', factor: (LB_KG * 1000) / 16 },
  kg: { unit: 'lb', factor: LB_KG },
  N: { unit: 'lbf', factor: LBF_N },
  kPa: { unit: 'psi', factor: LBF_N / (IN_M * IN_M) / 1000 },
  MPa: { unit: 'psi', factor: LBF_N / (IN_M * IN_M) / 1e6 },
  'kg/m³': { unit: 'lb/ft³', factor: LB_KG / (12 * IN_M) ** 3 },
  J: { unit: 'ft·lbf', factor: LBF_N * 12 * IN_M },
  'm/s': { unit: 'ft/s', factor: 12 * IN_M },
  'm/s²': { unit: 'ft/s²', factor: 12 * IN_M },
  'N·m': { unit: 'lbf·in', factor: LBF_N * IN_M },
  'mm²': { unit: 'in²', factor: (IN_M * 1000) ** 2 },
  'mm³': { unit: 'in³', factor: (IN_M * 1000) ** 3 },
  // 1 in³ per ft·lbf = 16 387.064 mm³ ÷ 1.3558179 J.
  'mm³/J': { unit: 'in³/(ft·lbf)', factor: (IN_M * 1000) ** 3 / (LBF_N * 12 * IN_M) },
};

export function isUnitSystem(value: unknown): value is UnitSystem {
  return value === 'si' || value === 'us';
}

/** The unit a value of this SI unit is shown in. */
export function displayUnit(siUnit: string, system: UnitSystem): string {
  return system === 'us' && US[siUnit] ? US[siUnit].unit : siUnit;
}

/** SI value → display value. Units without a US counterpart (ratios, ms, –) pass through. */
export function toDisplay(value: number, siUnit: string, system: UnitSystem): number {
  return system === 'us' && US[siUnit] ? value / US[siUnit].factor : value;
}

/** Display value (as typed) → SI value. */
export function fromDisplay(value: number, siUnit: string, system: UnitSystem): number {
  return system === 'us' && US[siUnit] ? value * US[siUnit].factor : value;
}

/** A value with its unit as text, to four significant figures. */
export function formatMeasure(value: number, siUnit: string, system: UnitSystem): string {
  const unit = displayUnit(siUnit, system);
  const shown = Number(toDisplay(value, siUnit, system).toPrecision(4));
  return unit === '–' ? String(shown) : `${shown} ${unit}`;
}

/**
 * A starting figure (a form's default, given in SI) as a round number in the reader's units. Rule:
 * two significant figures, or one where that stays within 2.5 % of the exact conversion — so
 * 20 mm reads 0.8 in (not 0.7874) and 1200 mm reads 47 in (50 would be 5.8 % off). A default in
 * the unit it was chosen in (SI, or a unit without a US counterpart) is shown exactly as given.
 * Only defaults are rounded: a figure the user typed is never changed.
 */
export function niceDefault(value: number, siUnit: string, system: UnitSystem): number {
  const shown = toDisplay(value, siUnit, system);
  if (shown === value || !Number.isFinite(shown) || shown === 0) return value;
  const one = Number(shown.toPrecision(1));
  return Math.abs(one / shown - 1) <= 0.025 ? one : Number(shown.toPrecision(2));
}
