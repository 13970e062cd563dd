import { formatDate } from '@/lib/dates';
import { Document, Page, StyleSheet, Text, View } from '@react-pdf/renderer';
import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';
import { shortCitation } from '@/lib/atlas/citations';
import { LINE_STAGES } from '@/lib/atlas/frontmatter';
import type { HandlingSheet } from '@/lib/atlas/sheet';
import { PDF_MONO, PDF_SANS } from './fonts';
import { pdfText as t } from './pdf-text';

const LEAF = '#2f5f2c';
const CLAY = '#8a4b16';
const GREY = '#57534e';

const s = StyleSheet.create({
  page: { padding: 36, paddingBottom: 48, fontFamily: PDF_SANS, fontSize: 9, color: '#1c1917' },
  kicker: { fontSize: 7.5, color: LEAF, letterSpacing: 1 },
  title: { fontSize: 20, fontFamily: 'Helvetica-Bold', marginTop: 2 },
  summary: { marginTop: 4 },
  meta: { marginTop: 4, fontSize: 8, color: GREY },
  rule: { borderBottomWidth: 1.5, borderBottomColor: LEAF, paddingBottom: 8, marginBottom: 10 },
  h2: { fontSize: 11, fontFamily: 'Helvetica-Bold', marginTop: 10, marginBottom: 5 },
  stages: { flexDirection: 'row', flexWrap: 'wrap' },
  stage: { width: '50%', paddingRight: 10, marginBottom: 6 },
  stageName: { fontFamily: 'Helvetica-Bold', marginBottom: 1.5 },
  bullet: { flexDirection: 'row', marginBottom: 1.5 },
  dot: { width: 8 },
  table: { marginBottom: 8 },
  cultivar: { fontFamily: 'Helvetica-Bold', marginBottom: 2 },
  row: { flexDirection: 'row', borderTopWidth: 0.5, borderTopColor: '#d6d3d1', paddingVertical: 2 },
  label: { width: '32%', color: GREY, paddingRight: 4 },
  value: { width: '30%', fontFamily: PDF_MONO, fontSize: 8, paddingRight: 4 },
  missing: { width: '30%', color: '#a8a29e', paddingRight: 4 },
  cite: { width: '38%', color: GREY, fontSize: 7.5 },
  caution: { marginTop: 8, padding: 6, backgroundColor: '#fbf4ec', borderLeftWidth: 3 },
  cautionTitle: { fontFamily: 'Helvetica-Bold', color: CLAY, marginBottom: 2 },
  small: { fontSize: 7.5, color: GREY, marginBottom: 1.5 },
  footer: { position: 'absolute', bottom: 22, left: 36, right: 36, fontSize: 7, color: GREY },
});

function Rules({ sheet }: { sheet: HandlingSheet }) {
  const fm = sheet.article.frontmatter;
  return (
    <View style={s.stages}>
      {fm.handling.map((h, i) => (
        <View key={h.stage} style={s.stage} wrap={false}>
          <Text style={s.stageName}>
            {`${i + 1}. ${LINE_STAGES[h.stage]}`}
            {h.stage === fm.mostProneStage ? ' (most prone)' : ''}
          </Text>
          {h.rules.map((rule) => (
            <View key={rule} style={s.bullet}>
              <Text style={s.dot}>•</Text>
              <Text style={{ flex: 1 }}>{t(rule)}</Text>
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

function Values({ sheet }: { sheet: HandlingSheet }) {
  return (
    <View>
      {sheet.cultivars.map((c) => (
        <View key={c.slug} style={s.table} wrap={false}>
          <Text style={s.cultivar}>
            {t(c.name)}
            {c.revision ? ` · revision ${c.revision}` : ' · nothing published yet'}
          </Text>
          {c.rows.map((row, i) => (
            <View key={`${row.quantity}-${i}`} style={s.row}>
              <Text style={s.label}>{t(row.label)}</Text>
              {row.value ? (
                <Text style={s.value}>{row.value}</Text>
              ) : (
                <Text style={s.missing}>no published value</Text>
              )}
              <Text style={s.cite}>{t(row.citation ?? '')}</Text>
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

/** The handling sheet as a PDF document: the same content as the printable page. */
export function SheetDocument({ sheet }: { sheet: HandlingSheet }) {
  const fm = sheet.article.frontmatter;
  return (
    <Document title={`Handling sheet: ${sheet.commodity.name}`} author="Tenderline" language="en">
      <Page size="A4" style={s.page}>
        <View style={s.rule}>
          <Text style={s.kicker}>TENDERLINE HANDLING SHEET</Text>
          <Text style={s.title}>{t(sheet.commodity.name)}</Text>
          <Text style={s.summary}>{t(fm.summary)}</Text>
          <Text style={s.meta}>
            {`Updated ${formatDate(fm.updated)} · most bruise-prone stage: ${LINE_STAGES[fm.mostProneStage]}`}
          </Text>
        </View>
        <Text style={s.h2}>Handling rules along the line</Text>
        <Rules sheet={sheet} />
        <Text style={s.h2} minPresenceAhead={120}>
          Key published values
        </Text>
        <Values sheet={sheet} />
        <View style={[s.caution, { borderLeftColor: CLAY }]} wrap={false}>
          <Text style={s.cautionTitle}>Caution</Text>
          <Text style={s.small}>{t(STANDING_CAUTION)}</Text>
          <Text style={s.small}>{t(MACHINERY_CAUTION)}</Text>
        </View>
        <Text style={s.h2} minPresenceAhead={40}>
          Sources
        </Text>
        {sheet.sources.map((src) => (
          <Text key={src.key} style={s.small}>
            {t(`${shortCitation(src)}: ${src.title}${src.venue ? `, ${src.venue}` : ''}.`)}
          </Text>
        ))}
        <Text
          style={s.footer}
          fixed
          render={({ pageNumber, totalPages }) =>
            `Tenderline · ${sheet.commodity.name} handling sheet · screening guidance, not a substitute for tests on your own fruit · page ${pageNumber} of ${totalPages}`
          }
        />
      </Page>
    </Document>
  );
}
