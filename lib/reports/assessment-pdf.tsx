import { Document, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import type { Assessment } from '@/lib/data/assessments';
import type { RegisteredCheck } from '@/lib/checks/registry';
import type { ChartSpec, Figure } from '@/lib/checks/report';
import type { UsedValue } from '@/lib/checks/used-value';
import { rungText } from '@/lib/evidence/rungs';
import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';
import { VERDICT_RULE } from '@/lib/checks/verdict';
import { PdfLineChart, type PdfSeries } from './pdf-chart';

const s = StyleSheet.create({
  page: { padding: 36, fontSize: 9, fontFamily: 'Helvetica', color: '#1c1917' },
  h1: { fontSize: 16, marginBottom: 4, fontFamily: 'Helvetica-Bold' },
  h2: { fontSize: 11, marginTop: 12, marginBottom: 4, fontFamily: 'Helvetica-Bold' },
  muted: { color: '#57534e' },
  row: { flexDirection: 'row', borderBottom: '0.5pt solid #d6d3d1', paddingVertical: 2 },
  cellLabel: { width: '40%' },
  cellValue: { width: '25%' },
  cellOrigin: { width: '35%', color: '#57534e' },
  cellWide: { width: '60%' },
  margin: { fontSize: 22, fontFamily: 'Helvetica-Bold', marginTop: 6 },
  caution: { marginTop: 12, padding: 6, backgroundColor: '#fbf4ec', color: '#8a4b16' },
});

const COLOURS = ['#2f5f2c', '#8a4b16', '#1d4ed8', '#7c3aed', '#be123c', '#0f766e'];

/** A figure as text in SI (the PDF is printed as the model computed it). */
function figureText(f: Figure): string {
  if (f.value === null) return f.text ?? '—';
  const unit = f.unit === '–' ? '' : ` ${f.unit}`;
  return `${Number(f.value.toPrecision(4))}${unit}${f.text ? ` ${f.text}` : ''}`;
}

function usedText(v: UsedValue | null): [string, string] {
  if (!v) return ['—', 'no published value'];
  const unit = v.unit === '–' ? '' : ` ${v.unit}`;
  return [`${Number(v.value.toPrecision(4))}${unit}`, rungText(v)];
}

function chartSeries(c: ChartSpec): PdfSeries[] {
  return c.series.map((s, i) => ({
    label: s.label,
    color: COLOURS[i % COLOURS.length],
    points: s.points,
  }));
}

const axis = (a: ChartSpec['x']) => (a.unit === '–' ? a.label : `${a.label} (${a.unit})`);

function FigureRows({ figures }: { figures: Figure[] }) {
  return figures.map((f) => (
    <View key={f.label} style={s.row}>
      <Text style={s.cellLabel}>{f.label}</Text>
      <Text style={s.cellWide}>{figureText(f)}</Text>
    </View>
  ));
}

function Report({ a, check }: { a: Assessment; check: RegisteredCheck }) {
  const report = check.show(a.results);
  const margin = report.margin;
  return (
    <Document title={a.title} author="Tenderline">
      <Page size="A4" style={s.page}>
        <Text style={s.h1}>{a.title}</Text>
        <Text style={s.muted}>
          {check.title} · version {a.version} · saved {new Date(a.createdAt).toUTCString()} by{' '}
          {a.ownerName} · model {a.modelVersion}
        </Text>
        <Text style={s.muted}>
          {a.cultivarName
            ? `Data: ${a.cultivarName}, property revision ${a.revisionNumber} (id ${a.revisionId})`
            : 'Data: values entered by hand'}
          {a.newerRevision ? ` — revision ${a.newerRevision.number} has been published since` : ''}
          {a.newerCommodityRevision
            ? ` — commodity record revision ${a.newerCommodityRevision.number} has been published since`
            : ''}
        </Text>
        {report.bruise ? <Text style={s.margin}>{report.bruise.words}</Text> : null}
        <Text style={s.margin}>
          {report.bruise ? 'Onset margin' : 'Bruise margin'}{' '}
          {margin ? `${margin.value.toFixed(2)} — ${margin.verdict}` : '— (no threshold)'}
        </Text>
        <Text style={s.muted}>
          {margin ? `Basis: ${margin.basis} threshold. ` : ''}
          {report.restsOn ? `${report.restsOn} ` : ''}
          {report.relation ? `${report.relation} ` : ''}
          {VERDICT_RULE}
        </Text>
        <Text style={s.h2}>Scenario</Text>
        <FigureRows figures={report.scenario} />
        <Text style={s.h2}>Results</Text>
        <FigureRows figures={report.figures} />
        <Text style={s.h2}>Fruit figures used</Text>
        {report.used.map(({ label, value }) => {
          const [shown, origin] = usedText(value);
          return (
            <View key={label} style={s.row}>
              <Text style={s.cellLabel}>{label}</Text>
              <Text style={s.cellValue}>{shown}</Text>
              <Text style={s.cellOrigin}>{origin}</Text>
            </View>
          );
        })}
        {report.charts.map((c) => (
          <View key={c.id} wrap={false}>
            <Text style={s.h2}>{c.title}</Text>
            <PdfLineChart series={chartSeries(c)} xLabel={axis(c.x)} yLabel={axis(c.y)} />
          </View>
        ))}
        {report.warnings.map((w) => (
          <Text key={w} style={s.muted}>
            • {w}
          </Text>
        ))}
        <Text style={s.h2}>Assumptions</Text>
        <Text>{check.assumptions}</Text>
        <View style={s.caution}>
          <Text>{STANDING_CAUTION}</Text>
          <Text>{MACHINERY_CAUTION}</Text>
        </View>
      </Page>
    </Document>
  );
}

/** The assessment report as a PDF, rendered on the server without a browser. */
export function assessmentPdf(a: Assessment, check: RegisteredCheck): Promise<Buffer> {
  return renderToBuffer(<Report a={a} check={check} />);
}
