import type { Assessment } from '@/lib/data/assessments';
import type { RegisteredCheck } from '@/lib/checks/registry';
import type { ChartSpec, Figure } from '@/lib/checks/report';
import type { UsedValue } from '@/lib/checks/used-value';
import { rungText } from '@/lib/evidence/rungs';
import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';
import { VERDICT_RULE } from '@/lib/checks/verdict';
import { formatMeasure, type UnitSystem } from '@/lib/units';
import { textIn } from '@/lib/phrase';
import { niceTicks, type NiceAxis } from './nice-ticks';
import { reportIn } from './report-units';

/** Words a check writes: a string, or words and SI measures to be shown in the reader's units. */
type Words = string | (string | { value: number; unit: string })[];
const wordsIn = (t: Words | null | undefined, system: UnitSystem): string =>
  t == null
    ? ''
    : typeof t === 'string'
      ? t
      : t.map((p) => (typeof p === 'string' ? p : formatMeasure(p.value, p.unit, system))).join('');

/** Four significant figures, without trailing zeros. */
const num = (x: number) => String(Number(x.toPrecision(4)));
const withUnit = (x: number, unit: string) => (unit === '–' ? num(x) : `${num(x)} ${unit}`);

function figureText(f: Figure, system: UnitSystem): string {
  const text = wordsIn(f.text as Words | undefined, system);
  if (f.value === null) return text || '—';
  return `${withUnit(f.value, f.unit)}${text ? ` ${text}` : ''}`;
}

function usedText(v: UsedValue | null): [string, string] {
  return v ? [withUnit(v.value, v.unit), rungText(v)] : ['—', 'no published value'];
}

export interface PdfChartText {
  id: string;
  title: string;
  xLabel: string;
  yLabel: string;
  x: NiceAxis;
  y: NiceAxis;
  series: { label: string; points: [number, number][] }[];
}

/** Everything the report PDF prints, as text and numbers already in the reader's units. */
export interface PdfText {
  title: string;
  meta: string[];
  headline: string[];
  basis: string;
  sections: { title: string; rows: string[][] }[];
  charts: PdfChartText[];
  warnings: string[];
  assumptions: string;
  cautions: string[];
}

const axisLabel = (a: ChartSpec['x']) => (a.unit === '–' ? a.label : `${a.label} (${a.unit})`);

/** A chart's axes at round ticks (Heckbert), from zero or below to the data's largest value. */
function chartText(c: ChartSpec): PdfChartText {
  const points = c.series.flatMap((s) => s.points);
  const extent = (i: 0 | 1, marks: number[]) => {
    const all = [...points.map((p) => p[i]), ...marks, 0];
    return niceTicks(Math.min(...all), Math.max(...all));
  };
  const xs = (c.markers ?? []).flatMap((m) => (m.x !== undefined ? [m.x] : []));
  const ys = (c.markers ?? []).flatMap((m) => (m.y !== undefined ? [m.y] : []));
  return {
    id: c.id,
    title: c.title,
    xLabel: axisLabel(c.x),
    yLabel: axisLabel(c.y),
    x: extent(0, xs),
    y: extent(1, ys),
    series: c.series,
  };
}

/**
 * The report's text for the PDF, in the reader's unit system: the check's report converted once
 * (reportIn), then every figure written with its unit, every label as the report words it.
 */
export function pdfText(a: Assessment, check: RegisteredCheck, system: UnitSystem): PdfText {
  const report = reportIn(check.show(a.results), system);
  const margin = report.margin;
  const data = a.cultivarName
    ? `Data: ${a.cultivarName}, property revision ${a.revisionNumber}`
    : 'Data: values entered by hand';
  return {
    title: a.title,
    meta: [
      `${check.title} · version ${a.version} · saved ${new Date(a.createdAt).toUTCString()} by ${a.ownerName} · model ${a.modelVersion}`,
      `${data}${a.newerRevision ? ` — revision ${a.newerRevision.number} has been published since` : ''}${
        a.newerCommodityRevision
          ? ` — commodity record revision ${a.newerCommodityRevision.number} has been published since`
          : ''
      }`,
    ],
    headline: [
      ...(report.bruise ? [textIn(report.bruise.words, system)] : []),
      `${report.bruise ? 'Onset margin' : 'Bruise margin'} ${
        margin ? `${margin.value.toFixed(2)} — ${margin.verdict}` : '— (no threshold)'
      }`,
    ],
    basis: [
      margin ? `Basis: ${margin.basis} threshold.` : '',
      report.restsOn ?? '',
      report.relation ? textIn(report.relation, system) : '',
      VERDICT_RULE,
    ]
      .filter(Boolean)
      .join(' '),
    sections: [
      { title: 'Scenario', rows: report.scenario.map((f) => [f.label, figureText(f, system)]) },
      { title: 'Results', rows: report.figures.map((f) => [f.label, figureText(f, system)]) },
      {
        title: 'Fruit figures used',
        rows: report.used.map(({ label, value }) => [label, ...usedText(value)]),
      },
    ],
    charts: report.charts.map(chartText),
    warnings: report.warnings.map((w) => textIn(w, system)),
    assumptions: check.assumptions,
    cautions: [STANDING_CAUTION, MACHINERY_CAUTION],
  };
}
