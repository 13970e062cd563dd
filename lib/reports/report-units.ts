import type { CheckReport, Figure } from '@/lib/checks/report';
import type { UsedValue } from '@/lib/checks/used-value';
import { displayUnit, toDisplay, type UnitSystem } from '@/lib/units';

/** The unit suffix of a curve column (`peak_pressure_kpa`) → its SI unit, longest first. */
const SUFFIXES: [string, string][] = [
  ['_kg_m3', 'kg/m³'],
  ['_m_s2', 'm/s²'],
  ['_m_s', 'm/s'],
  ['_mm3', 'mm³'],
  ['_kpa', 'kPa'],
  ['_mpa', 'MPa'],
  ['_mm', 'mm'],
  ['_n', 'N'],
  ['_g', 'g'],
  ['_j', 'J'],
];

/** A display unit as a column suffix: `psi` → `_psi`, `lb/ft³` → `_lb_ft3`, `ft·lbf` → `_ft_lbf`. */
const suffixOf = (unit: string) =>
  `_${unit
    .replace(/³/g, '3')
    .replace(/²/g, '2')
    .replace(/[^A-Za-z0-9]+/g, '_')
    .toLowerCase()}`;

/** A curve column's name and its SI unit ('–' when it names none). */
export function columnUnit(column: string): { stem: string; unit: string } {
  const hit = SUFFIXES.find(([suffix]) => column.endsWith(suffix));
  return hit
    ? { stem: column.slice(0, -hit[0].length), unit: hit[1] }
    : { stem: column, unit: '–' };
}

const figureIn = (f: Figure, system: UnitSystem): Figure => ({
  ...f,
  value: f.value === null ? null : toDisplay(f.value, f.unit, system),
  unit: displayUnit(f.unit, system),
});

function usedIn(v: UsedValue | null, system: UnitSystem): UsedValue | null {
  if (!v) return v;
  const shown = (x: number | null) => (x === null ? null : toDisplay(x, v.unit, system));
  return {
    ...v,
    value: toDisplay(v.value, v.unit, system),
    low: shown(v.low),
    high: shown(v.high),
    sd: shown(v.sd),
    unit: displayUnit(v.unit, system),
  };
}

/**
 * A check's report with every number and unit in the reader's system: figures, fruit values and
 * their spreads, charts (points, markers, axes) and the curve columns (values and the unit in each
 * column's name). The PDF and both CSV exports print this; SI readers get the report unchanged.
 */
export function reportIn(report: CheckReport, system: UnitSystem): CheckReport {
  if (system === 'si') return report;
  const columns = report.curves.columns.map(columnUnit);
  return {
    ...report,
    scenario: report.scenario.map((f) => figureIn(f, system)),
    figures: report.figures.map((f) => figureIn(f, system)),
    used: report.used.map(({ label, value }) => ({ label, value: usedIn(value, system) })),
    charts: report.charts.map((c) => ({
      ...c,
      x: { ...c.x, unit: displayUnit(c.x.unit, system) },
      y: { ...c.y, unit: displayUnit(c.y.unit, system) },
      series: c.series.map((s) => ({
        ...s,
        points: s.points.map(([x, y]): [number, number] => [
          toDisplay(x, c.x.unit, system),
          toDisplay(y, c.y.unit, system),
        ]),
      })),
      markers: c.markers?.map((m) =>
        m.x !== undefined
          ? { label: m.label, x: toDisplay(m.x, c.x.unit, system) }
          : { label: m.label, y: toDisplay(m.y, c.y.unit, system) },
      ),
    })),
    curves: {
      columns: columns.map(({ stem, unit }, i) =>
        unit === '–' ? report.curves.columns[i] : `${stem}${suffixOf(displayUnit(unit, system))}`,
      ),
      rows: report.curves.rows.map((row) =>
        row.map((v, i) => (v === null ? null : toDisplay(v, columns[i].unit, system))),
      ),
    },
  };
}
