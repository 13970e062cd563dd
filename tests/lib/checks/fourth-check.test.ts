import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { ReportResults } from '@/components/assessments/report-results';
import { curvesCsv } from '@/lib/checks/curves-csv';
import { defineCheck } from '@/lib/checks/registry';
import { overlayCharts } from '@/lib/checks/report';
import type { Assessment } from '@/lib/data/assessments';
import { assessmentPdf } from '@/lib/reports/assessment-pdf';
import { rollDescriptor } from './fourth-check/report';
import type { RollResult } from './fourth-check/result';

// A fourth check is one folder (./fourth-check: result schema and report) and one registry line
// (`defineCheck(descriptor, run)`): the report view, the PDF, the curves CSV and the comparison
// take it with no edit of their own, because they read only the check's report.
const result: RollResult = {
  check: 'roll',
  pinned: null,
  inputs_used: {
    mass_g: {
      value: 180,
      unit: 'g',
      rung: 'entered',
      source: null,
      note: null,
      spread: null,
      low: null,
      high: null,
      sd: null,
    },
    chute_length_mm: 900,
  },
  speed_m_s: 0.8,
  margin: { value: 1.2, basis: 'static', verdict: 'tight' },
  series: [
    { length_mm: 0, speed_m_s: 0 },
    { length_mm: 450, speed_m_s: 0.6 },
    { length_mm: 900, speed_m_s: 0.8 },
  ],
  warnings: ['Fixture warning shown as written.'],
};
const roll = defineCheck(rollDescriptor, async () => result);

describe('a fourth check added by one folder and one registry line', () => {
  it('runs through the registry contract and reads its saved result back through its schema', async () => {
    const saved = JSON.parse(JSON.stringify(await roll.run({} as never, {})));
    expect(roll.show(saved).figures).toEqual([{ label: 'Rolling speed', value: 0.8, unit: 'm/s' }]);
    // A saved result that does not match the schema is refused, not shown half-right.
    expect(() => roll.show({ ...saved, speed_m_s: 'fast' })).toThrow();
  });

  it('the report view shows its scenario, figures, used values and warnings', () => {
    const html = renderToStaticMarkup(createElement(ReportResults, { report: roll.show(result) }));
    expect(html).toContain('Chute length');
    expect(html).toContain('900 mm');
    expect(html).toContain('Rolling speed');
    expect(html).toContain('0.8 m/s');
    expect(html).toContain('Fixture warning shown as written.');
    expect(html).toContain('data-testid="chart-roll-speed"');
  });

  it('the curves CSV has its columns and rows', () => {
    expect(curvesCsv(roll.show(result).curves)).toBe(
      'length_mm,speed_m_s\r\n0,0\r\n450,0.6\r\n900,0.8\r\n',
    );
  });

  it('the comparison overlays two of its assessments chart by chart', () => {
    const charts = overlayCharts([
      { name: 'A', report: roll.show(result) },
      { name: 'B', report: roll.show({ ...result, series: result.series.slice(0, 2) }) },
    ]);
    expect(charts.map((c) => c.id)).toEqual(['roll-speed']);
    expect(charts[0].series.map((s) => [s.label, s.points.length])).toEqual([
      ['A', 3],
      ['B', 2],
    ]);
  });

  it('the PDF renders with its title, scenario and figures', async () => {
    const a = {
      id: 1,
      title: 'Chute to the sizer',
      version: 1,
      createdAt: '2026-12-05T10:00:00.000Z',
      ownerName: 'Fixture',
      modelVersion: 'fixture',
      cultivarName: null,
      newerRevision: null,
      results: result,
    } as unknown as Assessment;
    const pdf = await assessmentPdf(a, roll);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(pdf.length).toBeGreaterThan(2000);
  });
});
