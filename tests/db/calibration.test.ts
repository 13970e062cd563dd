import { beforeAll, describe, expect, it } from 'vitest';
import { siText } from '@/lib/phrase';
import { freshDatabase } from '../support/db';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { calibrationTable, type CalibrationRow } from '@/lib/checks/calibration';
import { runDropCheck } from '@/lib/checks/drop/check';

// The checks against the published record (the seeded database). The table is printed for the
// closing note; the assertions hold what the product claims, and the rows are all kept.

const engineer: Actor = { id: 0, email: 'e@test', name: 'E', role: 'engineer' };
let rows: CalibrationRow[];
const text = (p: CalibrationRow['published']) =>
  p.map((x) => (typeof x === 'string' ? x : `${x.value} ${x.unit}`)).join('');

describe('calibration against published outcomes', () => {
  beforeAll(async () => {
    await freshDatabase();
    rows = await calibrationTable(engineer);
    for (const r of rows)
      console.log(
        `${r.agrees ? 'agrees   ' : 'disagrees'} ${r.check} | ${r.case} | ${text(r.published)} (${r.source}) | ${text(r.predicted)} | ratio ${r.ratio}`,
      );
    const by = (c: string) => rows.filter((r) => r.check === c);
    console.log(
      ['squeeze', 'stack', 'drop']
        .map((c) => `${c}: ${by(c).filter((r) => r.agrees).length} of ${by(c).length} agree`)
        .join('; '),
    );
  }, 60_000);

  it('lists every published drop height on a surface the drop check models, once', async () => {
    // Counted here straight from the database: published (not typical) drop heights with an
    // observation, on the variants the drop check files under steel, hard plastic, belt rubber
    // or fruit, distinct by commodity, source, surface, height and observation.
    const MODELLED = [
      ...['steel', 'stainless steel', 'mild steel', 'galvanised steel', 'aluminium'],
      ...['rigid plate', 'concrete', 'hard plastic', 'plastic', 'belt rubber', 'rubber', 'fruit'],
    ];
    const figures = await db('revision_values as v')
      .join('cultivars as c', 'c.published_revision_id', 'v.revision_id')
      .leftJoin('sources as s', 's.id', 'v.source_id')
      .where('v.quantity', 'drop_threshold_height')
      .where('v.is_typical_default', false)
      .whereNotNull('v.observation')
      .whereIn('v.variant', MODELLED)
      .distinct('c.commodity_id', 's.key', 'v.variant', 'v.value', 'v.observation');
    const heights = rows.filter((r) => r.check === 'drop' && !/bruise volume/.test(r.case));
    expect(heights).toHaveLength(figures.length);
  });

  it('agrees where the product says it does', () => {
    const row = (check: string, match: RegExp) =>
      rows.find((r) => r.check === check && match.test(r.case))!;
    // Wang, Wang & Wu 2024: the squeeze's mean pressure at 54–80 N near the film's 0.26–0.31 MPa.
    expect(row('squeeze', /Apple between flat plates/).agrees).toBe(true);
    // A 600 mm apple bin is standard practice: the stack check must not call it beyond tolerance.
    expect(row('stack', /Apple in a 1200 × 1000 mm bin/).agrees).toBe(true);
    // Potato bruised at 50 mm onto a rigid plate: the estimate stays at or below it.
    expect(row('drop', /^Potato \(commodity record\) onto rigid plate/).agrees).toBe(true);
  });

  it('keeps the disagreements, and the drop check says so where it rests on the estimate', async () => {
    // The elastic estimate is far below the published peach drops (1.2 mm against 50 mm onto
    // plastic): a peach dropped onto belt rubber, where no figure is published, rests on that
    // estimate, and the answer must say it disagrees with the peach record.
    const peach = rows.find(
      (r) => r.check === 'drop' && /^Peach \(commodity record\)/.test(r.case),
    )!;
    expect(peach.agrees).toBe(false);
    const answer = await runDropCheck(engineer, {
      cultivar: 'peach-type',
      heightMm: 100,
      surface: 'belt rubber',
    });
    expect(answer.dynamic).toBeNull();
    expect(siText(answer.relation!)).toMatch(/disagrees with the published record for this fruit/);
  });

  it('sizes a drop bruise from a published bruise susceptibility where the fruit has one', async () => {
    const answer = await runDropCheck(engineer, {
      cultivar: 'strawberry-type',
      heightMm: 100,
      surface: 'steel',
    });
    const v = answer.bruise_volume!;
    // The Selva/Gavita figure (1640 mm³/J) comes first on the record; the impact energy is the
    // fruit's m·g·h with the mass the check used (0.1 m, g = 9.80665): 4 digits kept.
    expect(v).toMatchObject({ susceptibility_mm3_j: 1640, rung: 'commodity' });
    const energy = (answer.inputs_used.mass_g.value / 1000) * 9.80665 * 0.1;
    expect(v.impact_energy_j).toBeCloseTo(Number(energy.toPrecision(4)), 6);
    expect(Math.abs(v.volume_mm3 / (1640 * energy) - 1)).toBeLessThan(1e-3);
    expect(siText(answer.relation!)).toMatch(/published bruise susceptibility/);
    // Soft surfaces are never sized from a figure whose impactor went unnamed.
    const rubber = await runDropCheck(engineer, {
      cultivar: 'strawberry-type',
      heightMm: 100,
      surface: 'belt rubber',
    });
    expect(rubber.bruise_volume).toBeNull();
    // The points the stored figure was not made from: within a factor of 2 (printed above).
    const volumes = rows.filter((r) => /Strawberry bruise volume/.test(r.case));
    expect(volumes).toHaveLength(3);
  });
});
