import { ph, type Text } from '@/lib/phrase';
/**
 * What a saved check shows, described as plain data: the report page, the PDF, the curves CSV
 * and the comparison all render this, so none of them branches on the check's name. A check
 * supplies it from its validated result (see CheckDescriptor); units are SI, converted to the
 * reader's system only where it is shown.
 */
import type { z } from 'zod';
import type { BruiseView } from './bruise';
import type { UsedValue } from './used-value';
import type { Verdict } from './verdict';

/** One figure: a number with its SI unit ('–' for a ratio), or words where there is none. */
export interface Figure {
  label: string;
  value: number | null;
  unit: string;
  /** Shown in place of the number (and after it, when both are given: "onto steel"). */
  text?: string;
}

export interface Axis {
  label: string;
  unit: string;
}

/** A line across a chart: upright at an x (this drop, this fill) or level at a y (a threshold). */
export type Marker = { label: string } & ({ x: number; y?: never } | { y: number; x?: never });

/** A line chart: every series over the same axes; markers are lines at an x or at a y. */
export interface ChartSpec {
  /** Stable across assessments of one check, so a comparison overlays like with like. */
  id: string;
  title: string;
  x: Axis;
  y: Axis;
  series: { label: string; points: [number, number][] }[];
  markers?: Marker[];
}

export interface MarginView {
  value: number;
  verdict: Verdict;
  basis: string;
}

export interface CheckReport {
  /** Every input of the scenario (the machine, the drop, the bin) with its unit. */
  scenario: Figure[];
  /** The results worth reading at a glance. */
  figures: Figure[];
  /** The fruit's figures as used: value, rung and source. */
  used: { label: string; value: UsedValue | null }[];
  margin: MarginView | null;
  /** The weakest rung of evidence the verdict rests on, in words (null for older results). */
  restsOn: string | null;
  /** The predicted bruise judged against a grade rule, where the check sizes one. */
  bruise?: BruiseView | null;
  /** Which figure the verdict rests on when two could, and how they relate (drops). */
  relation?: Text | null;
  charts: ChartSpec[];
  /** The curves as columns (each named with its unit) and rows. */
  curves: { columns: string[]; rows: (number | null)[][] };
  warnings: Text[];
}

/** One check's contract with every place that shows a saved result. */
export interface CheckDescriptor<R> {
  title: string;
  /** Names the result's shape; stored with every saved result. */
  resultSchemaId: string;
  resultSchema: z.ZodType<R>;
  assumptions: string;
  report(result: R): CheckReport;
}

/** A series of objects as CSV columns; `columns` maps a result key to its header. */
export function curvesOf<T extends object>(
  rows: readonly T[],
  columns: readonly (readonly [keyof T & string, string])[],
): CheckReport['curves'] {
  return {
    columns: columns.map(([, header]) => header),
    rows: rows.map((row) =>
      columns.map(([key]) => {
        const v = row[key];
        return typeof v === 'number' ? v : null;
      }),
    ),
  };
}

/** Points of a series whose y is known. */
export function pointsOf<T>(rows: readonly T[], x: (r: T) => number, y: (r: T) => number | null) {
  return rows.flatMap((r): [number, number][] => {
    const v = y(r);
    return v === null ? [] : [[x(r), v]];
  });
}

/** What the margin divides, in words, from its basis. */
export function marginBasis(report: CheckReport): Text {
  const basis =
    report.margin?.basis === 'dynamic'
      ? 'Published dynamic threshold ÷ this drop.'
      : 'Static bruise threshold ÷ contact pressure.';
  return report.relation ? ph`${basis} ${report.relation}` : basis;
}

/**
 * The comparison's charts: each chart of the first report, with the like-named chart's series
 * of every report overlaid under that report's name (markers dropped: they differ per report).
 */
export function overlayCharts(shown: { name: string; report: CheckReport }[]): ChartSpec[] {
  if (!shown.length) return [];
  return shown[0].report.charts.map((chart) => ({
    ...chart,
    markers: [],
    series: shown.flatMap(({ name, report }) => {
      const same = report.charts.find((c) => c.id === chart.id);
      if (!same) return [];
      return same.series.map((s) => ({
        label: same.series.length > 1 ? `${name}: ${s.label}` : name,
        points: s.points,
      }));
    }),
  }));
}

/** The fruit's figures as every report lists them first. */
export function fruitUsedRows(u: {
  modulus_mpa: UsedValue;
  poisson_ratio: UsedValue;
  diameter_mm: UsedValue;
  axial_diameter_mm?: UsedValue;
  mass_g: UsedValue;
  density_kg_m3?: UsedValue;
  static_bruise_threshold_kpa: UsedValue | null;
}): CheckReport['used'] {
  return [
    { label: "Young's modulus", value: u.modulus_mpa },
    { label: "Poisson's ratio", value: u.poisson_ratio },
    { label: 'Diameter (equatorial)', value: u.diameter_mm },
    ...(u.axial_diameter_mm ? [{ label: 'Axial diameter', value: u.axial_diameter_mm }] : []),
    { label: 'Mass', value: u.mass_g },
    ...(u.density_kg_m3 ? [{ label: 'Density', value: u.density_kg_m3 }] : []),
    { label: 'Static bruise threshold', value: u.static_bruise_threshold_kpa },
  ];
}
