import { Document, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import type { Assessment } from '@/lib/data/assessments';
import { ASSUMPTIONS } from '@/lib/checks/assumptions';
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
  margin: { fontSize: 22, fontFamily: 'Helvetica-Bold', marginTop: 6 },
  caution: { marginTop: 12, padding: 6, backgroundColor: '#fbf4ec', color: '#8a4b16' },
});

type Used = { value: number; unit: string; origin: string; source: string | null } | null;

function inputsOf(a: Assessment): [string, Used][] {
  const used = (a.results as { inputs_used?: Record<string, unknown> }).inputs_used ?? {};
  return Object.entries(used)
    .filter(([, v]) => v === null || (typeof v === 'object' && v !== null && 'value' in v))
    .map(([k, v]) => [k.replace(/_/g, ' '), v as Used]);
}

function chartsOf(a: Assessment): { title: string; x: string; y: string; series: PdfSeries[] }[] {
  const series = ((a.results as { series?: Record<string, number>[] }).series ?? []) as Record<
    string,
    number
  >[];
  if (a.check === 'squeeze') {
    const r = a.results as unknown as {
      model: { steps: Record<string, number>[] };
      grip_profile: Record<string, number>[] | null;
    };
    return [
      {
        title: 'Pad force against travel',
        x: 'travel per pad (mm)',
        y: 'force (N)',
        series: [
          {
            label: 'F',
            color: '#2f5f2c',
            points: r.model.steps.map((p) => [p.travel_per_pad_mm, p.force_n]),
          },
        ],
      },
      ...(r.grip_profile
        ? [
            {
              title: 'Contact pressure at the grip point',
              x: 'radius (mm)',
              y: 'pressure (kPa)',
              series: [
                {
                  label: 'p',
                  color: '#8a4b16',
                  points: r.grip_profile.map((p) => [p.r_mm, p.pressure_kpa] as [number, number]),
                },
              ],
            },
          ]
        : []),
    ];
  }
  if (a.check === 'drop') {
    return [
      {
        title: 'Peak pressure against drop height',
        x: 'drop height (mm)',
        y: 'peak pressure (kPa)',
        series: [
          {
            label: 'p',
            color: '#2f5f2c',
            points: series.map((p) => [p.height_mm, p.peak_pressure_kpa]),
          },
        ],
      },
    ];
  }
  return [
    {
      title: 'Pressure against fill depth',
      x: 'fill depth (mm)',
      y: 'pressure (kPa)',
      series: [
        {
          label: 'bin',
          color: '#57534e',
          points: series.map((p) => [p.depth_mm, p.vertical_pressure_kpa]),
        },
        {
          label: 'contact',
          color: '#2f5f2c',
          points: series.map((p) => [p.depth_mm, p.contact_pressure_kpa]),
        },
      ],
    },
  ];
}

function Report({ a }: { a: Assessment }) {
  const margin = (
    a.results as { margin?: { value: number; verdict: string; basis: string } | null }
  ).margin;
  return (
    <Document title={a.title} author="Tenderline">
      <Page size="A4" style={s.page}>
        <Text style={s.h1}>{a.title}</Text>
        <Text style={s.muted}>
          {a.check} check · version {a.version} · saved {new Date(a.createdAt).toUTCString()} by{' '}
          {a.ownerName}
        </Text>
        <Text style={s.muted}>
          {a.cultivarName
            ? `Data: ${a.cultivarName}, property revision ${a.revisionNumber} (id ${a.revisionId})`
            : 'Data: values entered by hand'}
          {a.newerRevision ? ` — revision ${a.newerRevision.number} has been published since` : ''}
        </Text>
        <Text style={s.margin}>
          Bruise margin{' '}
          {margin ? `${margin.value.toFixed(2)} — ${margin.verdict}` : '— (no threshold)'}
        </Text>
        <Text style={s.muted}>
          {margin ? `Basis: ${margin.basis} threshold. ` : ''}
          {VERDICT_RULE}
        </Text>
        <Text style={s.h2}>Inputs used</Text>
        {inputsOf(a).map(([label, v]) => (
          <View key={label} style={s.row}>
            <Text style={s.cellLabel}>{label}</Text>
            <Text style={s.cellValue}>
              {v ? `${Number(v.value.toPrecision(4))} ${v.unit === '–' ? '' : v.unit}` : '—'}
            </Text>
            <Text style={s.cellOrigin}>
              {v ? `${v.origin}${v.source ? ` — ${v.source}` : ''}` : 'no published value'}
            </Text>
          </View>
        ))}
        {chartsOf(a).map((c) => (
          <View key={c.title} wrap={false}>
            <Text style={s.h2}>{c.title}</Text>
            <PdfLineChart series={c.series} xLabel={c.x} yLabel={c.y} />
          </View>
        ))}
        {((a.results as { warnings?: string[] }).warnings ?? []).map((w) => (
          <Text key={w} style={s.muted}>
            • {w}
          </Text>
        ))}
        <Text style={s.h2}>Assumptions</Text>
        <Text>{ASSUMPTIONS[a.check]}</Text>
        <View style={s.caution}>
          <Text>{STANDING_CAUTION}</Text>
          <Text>{MACHINERY_CAUTION}</Text>
        </View>
      </Page>
    </Document>
  );
}

/** The assessment report as a PDF, rendered on the server without a browser. */
export function assessmentPdf(a: Assessment): Promise<Buffer> {
  return renderToBuffer(<Report a={a} />);
}
