import { createElement, useState, type ReactNode } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { getCultivar, listPublishedCultivars } from '@/lib/data/cultivars';
import { getAssessment } from '@/lib/data/assessments';
import { CHECKS } from '@/lib/checks/registry';
import { pdfText } from '@/lib/reports/pdf-text';
import { QUANTITY_KEYS } from '@/lib/properties/quantities';
import { parseTableQuery } from '@/lib/properties/table-query';
import { toTableRows, type TableRow } from '@/lib/properties/table-rows';
import { viewCsv } from '@/lib/properties/view-csv';
import type { UnitSystem } from '@/lib/units';
import { UnitsProvider } from '@/components/units/units-provider';
import { ColumnPicker } from '@/components/properties/column-picker';
import { QuantityList } from '@/components/properties/quantity-list';
import { TableFilters } from '@/components/properties/table-filters';
import { TableGrid } from '@/components/properties/table-grid';
import { usePropertiesTable } from '@/components/properties/use-properties-table';
import { ReportResults } from '@/components/assessments/report-results';
import * as list from '@/app/api/assessments/route';
import * as curves from '@/app/api/assessments/[id]/curves/route';
import * as report from '@/app/api/assessments/[id]/report/route';
import * as inputs from '@/app/api/assessments/[id]/inputs/route';
import * as cultivarsRoute from '@/app/api/cultivars/route';

// The units of each system, written out by hand (not read from lib/units): a page or export in
// one system must show none of the other's beside a number, in a heading's "(unit)", or as a CSV
// column's unit suffix.
const UNITS: Record<UnitSystem, string[]> = {
  si: ['mm³/J', 'mm³', 'mm²', 'mm', 'MPa', 'kPa', 'kg/m³', 'm/s²', 'm/s', 'N·m', 'N', 'g', 'J'],
  us: ['in³/(ft·lbf)', 'in³', 'in²', 'in', 'psi', 'lb/ft³', 'ft/s²', 'ft/s', 'lbf·in', 'lbf', 'oz'],
};
const SUFFIXES: Record<UnitSystem, string[]> = {
  si: ['mm', 'kpa', 'mpa', 'n', 'g', 'j', 'kg_m3', 'm_s', 'm_s2'],
  us: ['in', 'psi', 'lbf', 'oz', 'lb_ft3', 'ft_lbf', 'ft_s', 'ft_s2'],
};
const other = (s: UnitSystem): UnitSystem => (s === 'si' ? 'us' : 'si');
const escape = (u: string) => u.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');

/** Every place in a text where a unit of `system` stands beside a number or in "(unit)". */
function unitsOf(system: UnitSystem, text: string): string[] {
  const found: string[] = [];
  for (const u of UNITS[system]) {
    const re = new RegExp(`(\\d\\s?${escape(u)}(?![\\w³²·/(])|\\(${escape(u)}\\))`, 'g');
    for (const m of text.matchAll(re))
      found.push(process.env.UNITS_WALK_DEBUG ? text.slice(m.index - 60, m.index + 20) : m[0]);
  }
  return found;
}

/** A CSV header's columns whose unit suffix is of `system`. */
function suffixesOf(system: UnitSystem, header: string): string[] {
  return header
    .split(',')
    .filter((c) => SUFFIXES[system].some((s) => new RegExp(`_${s}$`).test(c.trim())));
}

// Quoted prose (a method, a note, how a source was read) is shown as written and marked so; a
// note may carry its own conversion ("14 in × 25.4 = 355.6 mm"), which is not a display unit.
const textOf = (html: string) =>
  html
    .replace(/<span data-prose="">[^<]*<\/span>/g, ' ')
    .replace(/<[^>]+>/g, ' ')
    .replace(/&amp;/g, '&')
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/&quot;/g, '"');

type Provided = Parameters<typeof UnitsProvider>[0];
const within = (system: UnitSystem, node: ReactNode) =>
  textOf(renderToStaticMarkup(createElement(UnitsProvider, { system } as Provided, node)));

/** The properties table as the page draws it: filters, column picker, every column, one page. */
function WholeTable({ rows }: { rows: TableRow[] }) {
  const [view, setView] = useState(() => ({
    ...parseTableQuery(new URLSearchParams('range=youngs_modulus&min=2')),
    columns: [...QUANTITY_KEYS],
    pageSize: 100,
  }));
  const table = usePropertiesTable(rows, view, setView);
  return createElement(
    'div',
    null,
    createElement(TableFilters, { rows, view, onChange: setView }),
    createElement(ColumnPicker, { view, onChange: setView }),
    createElement(TableGrid, { table }),
  );
}

const req = (url: string, method = 'GET', body?: unknown) =>
  new Request(url, {
    method,
    headers: { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = (id: number) => ({ params: Promise.resolve({ id: String(id) }) });

// Illustrative inputs, not data: an 80 mm, 200 g fruit with E = 3 MPa.
const FRUIT = { modulusMpa: 3, poisson: 0.35, diameterMm: 80, massG: 200, staticThresholdKpa: 100 };
const SAVES = [
  { check: 'drop', title: 'Drop', inputs: { ...FRUIT, heightMm: 150, surface: 'steel' } },
  {
    check: 'stack',
    title: 'Bin',
    inputs: { ...FRUIT, binLengthMm: 1200, binWidthMm: 1000, fillDepthMm: 600 },
  },
  {
    check: 'squeeze',
    title: 'Gripper',
    inputs: { ...FRUIT, friction: 0.5, padDiameterMm: 20, padEdgeMm: 2, maxTravelMm: 2 },
  },
];

describe('one unit system per reader, everywhere', () => {
  let engineer: Actor;
  const saved: number[] = [];
  beforeAll(async () => {
    await freshDatabase();
    const id = await userId(ACCOUNTS.engineer);
    engineer = (await getActiveActor(id))!;
    signInAs(id);
    for (const s of SAVES) {
      const res = await list.POST(req('http://tenderline.test/api/assessments', 'POST', s), {});
      const json = await res.json();
      expect(res.status, JSON.stringify(json)).toBe(201);
      saved.push(json.assessment.id);
    }
  });

  for (const system of ['si', 'us'] as const) {
    describe(`in ${system === 'si' ? 'SI' : 'US customary'} units`, () => {
      beforeAll(async () => {
        await db('users').where({ id: engineer.id }).update({ unit_system: system });
      });

      it('the properties table (headers, values, ranges, filter, column picker) and its CSV', async () => {
        const rows = toTableRows(await listPublishedCultivars(engineer));
        expect(rows.length).toBeGreaterThan(20);
        const text = within(system, createElement(WholeTable, { rows }));
        // The page shows its own units (a filled table, not an empty one that trivially passes).
        expect(unitsOf(system, text).length).toBeGreaterThan(50);
        expect(unitsOf(other(system), text)).toEqual([]);
        expect(text).toContain(system === 'us' ? 'At least (psi)' : 'At least (MPa)');
        const csv = viewCsv(rows, [...QUANTITY_KEYS], system);
        const [header, ...body] = csv.split('\r\n');
        expect(suffixesOf(system, header).length).toBeGreaterThan(3);
        expect(suffixesOf(other(system), header)).toEqual([]);
        expect(unitsOf(other(system), body.join('\n'))).toEqual([]);
      });

      it('the full properties CSV', async () => {
        const res = await cultivarsRoute.GET(
          req('http://tenderline.test/api/cultivars?format=csv'),
          {},
        );
        const csv = await res.text();
        expect(res.status).toBe(200);
        const units = csv
          .split('\r\n')
          .slice(1)
          .map((line) => line.split(',')[6]);
        expect(units).toContain(system === 'us' ? 'psi' : 'MPa');
        expect(units.filter((u) => UNITS[other(system)].includes(u))).toEqual([]);
      });

      it('every cultivar page: section headings, values, conditions', async () => {
        const all = await listPublishedCultivars(engineer);
        let own = 0;
        for (const c of all) {
          const cultivar = await getCultivar(engineer, c.slug);
          const text = within(system, createElement(QuantityList, { values: cultivar.values }));
          own += unitsOf(system, text).length;
          expect(unitsOf(other(system), text), c.slug).toEqual([]);
        }
        expect(own).toBeGreaterThan(100);
      });

      it('each assessment: the report view and its inputs CSV (figures, used values, notes)', async () => {
        for (const id of saved) {
          const a = await getAssessment(engineer, id);
          const shown = CHECKS[a.check].show(a.results);
          const view = within(system, createElement(ReportResults, { report: shown }));
          expect(unitsOf(other(system), view), `${a.check} report`).toEqual([]);
          const inputsCsv = await (
            await inputs.GET(req('http://tenderline.test/x'), ctx(id))
          ).text();
          expect(unitsOf(other(system), inputsCsv), `${a.check} inputs CSV`).toEqual([]);
          const unitColumn = inputsCsv.split('\r\n').map((l) => l.split(',')[2]);
          expect(unitColumn.filter((u) => UNITS[other(system)].includes(u))).toEqual([]);
        }
      });

      it('each assessment: the PDF text, the PDF itself, the curves CSV, the inputs CSV unit column', async () => {
        for (const id of saved) {
          const a = await getAssessment(engineer, id);
          const t = pdfText(a, CHECKS[a.check], system);
          // Labels, figures, fruit values, axes: what the PDF lays out from the report's numbers.
          const printed = [
            ...t.meta,
            ...t.sections.flatMap((s) => s.rows.map((r) => r.slice(0, 2).join(': '))),
            ...t.charts.flatMap((c) => [c.xLabel, c.yLabel]),
          ].join('\n');
          expect(unitsOf(system, printed).length, `${a.check} PDF`).toBeGreaterThan(3);
          expect(unitsOf(other(system), printed), `${a.check} PDF`).toEqual([]);
          // Labels in words: no stored key ("modulus_mpa", "density kg m3") reaches the PDF.
          expect(printed).not.toMatch(/\b[a-z]+_[a-z0-9_]+\b|\bkg m3\b|\bmpa\b/);
          // Ticks at round values: 1, 2 or 5 × a power of ten apart, each a multiple of it.
          for (const c of t.charts)
            for (const axis of [c.x, c.y]) {
              const mantissa = axis.step / 10 ** Math.floor(Math.log10(axis.step));
              expect([1, 2, 5]).toContain(Math.round(mantissa * 1e9) / 1e9);
              for (const tick of axis.ticks)
                expect(Math.abs(tick / axis.step - Math.round(tick / axis.step))).toBeLessThan(
                  1e-9,
                );
            }

          const pdf = await report.GET(req('http://tenderline.test/x'), ctx(id));
          expect(pdf.status).toBe(200);
          expect(pdf.headers.get('content-type')).toBe('application/pdf');

          const inputsCsv = await (
            await inputs.GET(req('http://tenderline.test/x'), ctx(id))
          ).text();
          const unitColumn = inputsCsv.split('\r\n').map((l) => l.split(',')[2]);
          expect(unitColumn.filter((u) => UNITS[other(system)].includes(u))).toEqual([]);

          const curvesCsv = await (
            await curves.GET(req('http://tenderline.test/x'), ctx(id))
          ).text();
          const header = curvesCsv.split('\r\n')[0];
          expect(suffixesOf(system, header).length, `${a.check} curves`).toBeGreaterThan(0);
          expect(suffixesOf(other(system), header), `${a.check} curves`).toEqual([]);
        }
      });
    });
  }

  for (const system of ['si', 'us'] as const) {
    // The sentences a check writes (the bruise and its grade rule, how a fruit figure was derived,
    // warnings) and the origin column beside each fruit value, in the PDF.
    it(`the PDF's sentences in ${system} units`, async () => {
      await db('users').where({ id: engineer.id }).update({ unit_system: system });
      for (const id of saved) {
        const a = await getAssessment(engineer, id);
        const t = pdfText(a, CHECKS[a.check], system);
        const words = [
          ...t.headline,
          t.basis,
          ...t.sections.flatMap((s) => s.rows.map((r) => r.slice(2).join(' '))),
          ...t.warnings,
        ].join('\n');
        expect(unitsOf(other(system), words), `${a.check} PDF sentences`).toEqual([]);
      }
    });
  }

  it('converts, not just relabels: the stack CSV depth column is the SI one ÷ 25.4', async () => {
    const stackId = saved[1];
    const column = async (system: UnitSystem) => {
      await db('users').where({ id: engineer.id }).update({ unit_system: system });
      const csv = await (await curves.GET(req('http://tenderline.test/x'), ctx(stackId))).text();
      const [header, ...rows] = csv.trim().split('\r\n');
      return { name: header.split(',')[0], values: rows.map((r) => Number(r.split(',')[0])) };
    };
    const si = await column('si');
    const us = await column('us');
    expect([si.name, us.name]).toEqual(['depth_mm', 'depth_in']);
    expect(us.values).toHaveLength(si.values.length);
    // 1 in = 25.4 mm exactly; 1e-9 relative leaves room for the CSV's printed digits only.
    us.values.forEach((v, i) =>
      expect(Math.abs(v * 25.4 - si.values[i])).toBeLessThan(1e-9 * (1 + si.values[i])),
    );
  });
});
