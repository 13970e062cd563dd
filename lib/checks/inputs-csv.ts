import { toCsv, type CsvCell } from '@/lib/csv';
import { RUNG_LABELS } from '@/lib/evidence/rungs';
import type { CheckReport } from './report';
import type { PinnedSummary } from './used-value';

export const INPUTS_CSV_COLUMNS = [
  'figure',
  'value',
  'unit',
  'rung',
  'source',
  'note',
  'spread_low',
  'spread_high',
  'spread_sd',
  'spread_basis',
];

/**
 * A saved check's inputs as CSV: the scenario as entered, then every fruit and bin figure with
 * its rung of evidence, source, note and the band the probability samples; last the revisions it
 * pinned and the model version, so the file alone says what the result rests on.
 */
export function inputsCsv(
  report: CheckReport,
  pinned: PinnedSummary,
  modelVersion: string,
  restsOn: string | null,
): string {
  const rows: CsvCell[][] = [
    ...report.scenario.map((f) => [
      f.label,
      f.value ?? f.text ?? null,
      f.unit,
      RUNG_LABELS.entered,
      null,
      f.value !== null && f.text ? f.text : null,
      null,
      null,
      null,
      null,
    ]),
    ...report.used.map(({ label, value: v }) =>
      v
        ? [
            label,
            v.value,
            v.unit,
            RUNG_LABELS[v.rung],
            v.source,
            v.note,
            v.low,
            v.high,
            v.sd,
            v.spread,
          ]
        : [label, null, null, 'no value on any rung', null, null, null, null, null, null],
    ),
  ];
  if (pinned) {
    rows.push([
      'cultivar revision',
      pinned.revision_number,
      null,
      pinned.name,
      pinned.cultivar,
      `revision id ${pinned.revision_id}`,
      null,
      null,
      null,
      null,
    ]);
    if (pinned.commodity_record)
      rows.push([
        'commodity record revision',
        pinned.commodity_record.revision_number,
        null,
        pinned.commodity,
        pinned.commodity_record.cultivar,
        `revision id ${pinned.commodity_record.revision_id}`,
        null,
        null,
        null,
        null,
      ]);
    if (pinned.stage)
      rows.push(['ripeness stage', pinned.stage, null, null, null, null, null, null, null, null]);
  }
  rows.push(['model version', modelVersion, null, null, null, null, null, null, null, null]);
  if (restsOn)
    rows.push(['verdict evidence', restsOn, null, null, null, null, null, null, null, null]);
  return toCsv(INPUTS_CSV_COLUMNS, rows);
}
