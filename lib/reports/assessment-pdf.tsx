import { Document, Page, StyleSheet, Text, View, renderToBuffer } from '@react-pdf/renderer';
import type { Assessment } from '@/lib/data/assessments';
import type { RegisteredCheck } from '@/lib/checks/registry';
import type { UnitSystem } from '@/lib/units';
import { COLOURS, PdfLineChart } from './pdf-chart';
import { pdfText, type PdfText } from './pdf-text';

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

function Rows({ rows }: { rows: string[][] }) {
  return rows.map(([label, ...cells]) => (
    <View key={label} style={s.row}>
      <Text style={s.cellLabel}>{label}</Text>
      {cells.length === 1 ? (
        <Text style={s.cellWide}>{cells[0]}</Text>
      ) : (
        <>
          <Text style={s.cellValue}>{cells[0]}</Text>
          <Text style={s.cellOrigin}>{cells[1]}</Text>
        </>
      )}
    </View>
  ));
}

function Report({ t }: { t: PdfText }) {
  return (
    <Document title={t.title} author="Tenderline">
      <Page size="A4" style={s.page}>
        <Text style={s.h1}>{t.title}</Text>
        {t.meta.map((line) => (
          <Text key={line} style={s.muted}>
            {line}
          </Text>
        ))}
        {t.headline.map((line) => (
          <Text key={line} style={s.margin}>
            {line}
          </Text>
        ))}
        <Text style={s.muted}>{t.basis}</Text>
        {t.sections.map((section) => (
          <View key={section.title}>
            <Text style={s.h2}>{section.title}</Text>
            <Rows rows={section.rows} />
          </View>
        ))}
        {t.charts.map((c) => (
          <View key={c.id} wrap={false}>
            <Text style={s.h2}>{c.title}</Text>
            <PdfLineChart chart={c} />
            {c.series.map((line, i) => (
              <Text key={line.label} style={{ color: COLOURS[i % COLOURS.length] }}>
                — {line.label}
              </Text>
            ))}
          </View>
        ))}
        {t.warnings.map((w) => (
          <Text key={w} style={s.muted}>
            • {w}
          </Text>
        ))}
        <Text style={s.h2}>Assumptions</Text>
        <Text>{t.assumptions}</Text>
        <View style={s.caution}>
          {t.cautions.map((c) => (
            <Text key={c}>{c}</Text>
          ))}
        </View>
      </Page>
    </Document>
  );
}

/** The assessment report as a PDF in the reader's units, rendered on the server without a browser. */
export function assessmentPdf(
  a: Assessment,
  check: RegisteredCheck,
  system: UnitSystem = 'si',
): Promise<Buffer> {
  return renderToBuffer(<Report t={pdfText(a, check, system)} />);
}
