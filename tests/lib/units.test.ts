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

describe('acceleration and round defaults', () => {
  it('shows m/s² as ft/s² (1 ft = 0.3048 m exactly, NIST SP 811 B.8)', async () => {
    const { displayUnit, toDisplay } = await import('@/lib/units');
    expect(displayUnit('m/s²', 'us')).toBe('ft/s²');
    // Standard gravity 9.80665 m/s² = 32.174 05 ft/s² (9.80665 ÷ 0.3048); relative 1e-9.
    expect(Math.abs(toDisplay(9.80665, 'm/s²', 'us') / 32.17404856 - 1)).toBeLessThan(1e-9);
  });

  it('rounds a converted default to 2 significant figures, or 1 within 2.5 %', async () => {
    const { niceDefault } = await import('@/lib/units');
    // 20 mm = 0.7874 in: one figure (0.8) is 1.6 % off, within 2.5 %.
    expect(niceDefault(20, 'mm', 'us')).toBe(0.8);
    // 1200 mm = 47.24 in: one figure (50) is 5.8 % off, so two: 47.
    expect(niceDefault(1200, 'mm', 'us')).toBe(47);
    // 180 g = 6.349 oz: 6 is 5.5 % off, so 6.3.
    expect(niceDefault(180, 'g', 'us')).toBe(6.3);
    // 100 kPa = 14.50 psi: 10 is 31 % off, so 15 (two figures).
    expect(niceDefault(100, 'kPa', 'us')).toBe(15);
  });

  it('leaves SI defaults and unitless ones exactly as given', async () => {
    const { niceDefault } = await import('@/lib/units');
    expect(niceDefault(1.25, 'mm', 'si')).toBe(1.25);
    expect(niceDefault(0.35, '–', 'us')).toBe(0.35);
    expect(niceDefault(6.5, 'ms', 'us')).toBe(6.5);
    expect(niceDefault(0, 'mm', 'us')).toBe(0);
  });
});
