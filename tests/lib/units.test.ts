import { describe, expect, it } from 'vitest';
import { displayUnit, formatMeasure, fromDisplay, toDisplay } from '@/lib/units';

// Conversion factors from NIST Special Publication 811 (2008), Appendix B.8, written out here
// (not read from the module): exact ones for the inch and pound, and the tabulated values.
const NIST: [string, string, number][] = [
  ['mm', 'in', 25.4], // exact
  ['g', 'oz', 28.349523125], // exact
  ['N', 'lbf', 4.4482216152605], // exact from 0.45359237 kg × 9.80665 m/s²
  ['kPa', 'psi', 6.894757293168], // 6.894 757 E+03 Pa
  ['kg/m³', 'lb/ft³', 16.01846337396], // 1.601 846 E+01
  ['J', 'ft·lbf', 1.3558179483314], // 1.355 818 E+00
];

describe('display units', () => {
  for (const [si, us, factor] of NIST) {
    it(`1 ${us} = ${factor} ${si}`, () => {
      expect(displayUnit(si, 'us')).toBe(us);
      // Relative 1e-12: the factors are exact or given to 13+ digits; only round-off remains.
      expect(Math.abs(fromDisplay(1, si, 'us') / factor - 1)).toBeLessThan(1e-12);
    });
  }

  it('round-trips SI → display → SI to round-off (1e-12 relative) for every unit', () => {
    for (const [si] of NIST) {
      for (const v of [1e-3, 0.37, 2.5, 900, 12345.678]) {
        const back = fromDisplay(toDisplay(v, si, 'us'), si, 'us');
        expect(Math.abs(back / v - 1)).toBeLessThan(1e-12);
      }
    }
  });

  it('leaves SI users, ratios and units without a US counterpart alone', () => {
    expect(toDisplay(80, 'mm', 'si')).toBe(80);
    expect(displayUnit('–', 'us')).toBe('–');
    expect(toDisplay(0.35, '–', 'us')).toBe(0.35);
    expect(formatMeasure(6.5, 'ms', 'us')).toBe('6.5 ms');
  });

  it('formats to four significant figures with the unit', () => {
    // 80 mm ÷ 25.4 = 3.1496… in; 607 kPa ÷ 6.894757 = 88.04 psi.
    expect(formatMeasure(80, 'mm', 'us')).toBe('3.15 in');
    expect(formatMeasure(607, 'kPa', 'us')).toBe('88.04 psi');
    expect(formatMeasure(0.35, '–', 'si')).toBe('0.35');
  });
});

describe('values with their spread in the reader units', () => {
  it('converts the value and both ends of the range, and a standard deviation', async () => {
    const { formatValueIn } = await import('@/lib/properties/format-units');
    // 2.52 MPa = 365.5 psi; 2.36 → 342.3; 3.28 → 475.7 (NIST SP 811 factor 6.894757e-3 MPa/psi).
    expect(formatValueIn({ value: 2.52, unit: 'MPa', low: 2.36, high: 3.28, sd: null }, 'us')).toBe(
      '365.5 psi (342.3–475.7)',
    );
    expect(formatValueIn({ value: 80, unit: 'mm', low: null, high: null, sd: 5 }, 'us')).toBe(
      '3.15 in ± 0.1969',
    );
    expect(formatValueIn({ value: 0.35, unit: '–', low: null, high: null, sd: null }, 'us')).toBe(
      '0.35',
    );
    expect(formatValueIn({ value: 2.52, unit: 'MPa', low: 2.36, high: 3.28, sd: null }, 'si')).toBe(
      '2.52 MPa (2.36–3.28)',
    );
  });
});
