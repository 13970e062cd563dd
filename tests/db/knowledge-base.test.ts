import { beforeAll, describe, expect, it } from 'vitest';
import { freshDatabase } from '../support/db';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { COVERED_CHECKS, coverageOf, rungCounts, type RecordCoverage } from '@/lib/checks/coverage';
import type { CultivarRecord } from '@/lib/properties/records';

// The knowledge base measured as a user meets it: for every published record, what the squeeze,
// drop and stack checks take with nothing typed but the machine (the evidence ladder), figure by
// figure with its rung. The counts are printed for the closing note.

const reader: Actor = { id: 0, email: 'reader@test', name: 'Reader', role: 'buyer' };

let records: CultivarRecord[];
let coverage: RecordCoverage[];

describe('the knowledge base feeds every check', () => {
  beforeAll(async () => {
    await freshDatabase();
    records = await listPublishedCultivars(reader);
    coverage = records.map((r) => coverageOf(r, records));
  });

  it('every commodity has exactly one commodity record, named as such', async () => {
    const commodities = await db('commodities').select('id', 'name');
    for (const c of commodities) {
      const own = records.filter((r) => r.commodity.id === c.id && r.isType);
      expect(
        own.map((r) => r.name),
        c.name,
      ).toEqual([`${c.name} (commodity record)`]);
    }
    expect(records.some((r) => r.name.includes('cultivar not named'))).toBe(false);
  });

  it('every commodity record is complete for the three checks (published, or typical labelled so)', () => {
    // The list of the knowledge-base issue, written out: each item and the variants that meet it.
    const RIGID = ['steel', 'stainless steel', 'mild steel', 'galvanised steel', 'aluminium'];
    const need: [string, (v: CultivarRecord['values'][number]) => boolean][] = [
      ["Young's modulus", (v) => v.quantity === 'youngs_modulus'],
      ["Poisson's ratio", (v) => v.quantity === 'poisson_ratio'],
      ['density', (v) => v.quantity === 'density'],
      ['equatorial diameter', (v) => v.quantity === 'diameter' && v.variant === 'equatorial'],
      ['axial diameter', (v) => v.quantity === 'diameter' && v.variant === 'axial'],
      ['mass', (v) => v.quantity === 'mass'],
      [
        'static threshold or bioyield stress',
        (v) => v.quantity === 'static_bruise_threshold' || v.quantity === 'bioyield_stress',
      ],
      [
        'friction on rubber',
        (v) => v.quantity === 'friction_coefficient' && /rubber/.test(v.variant),
      ],
      [
        'friction on steel',
        (v) => v.quantity === 'friction_coefficient' && RIGID.includes(v.variant),
      ],
      [
        'friction on plastic',
        (v) => v.quantity === 'friction_coefficient' && /plastic/.test(v.variant),
      ],
      ['bulk density', (v) => v.quantity === 'bulk_density'],
    ];
    const gaps: string[] = [];
    for (const r of records.filter((x) => x.isType)) {
      for (const [label, ok] of need) if (!r.values.some(ok)) gaps.push(`${r.slug}: ${label}`);
      const surfaces = new Set(
        r.values
          .filter(
            (v) =>
              v.quantity === 'drop_threshold_height' || v.quantity === 'impact_threshold_energy',
          )
          .map((v) => v.variant),
      );
      if (surfaces.size < 2)
        gaps.push(`${r.slug}: impact figures onto ${surfaces.size} surface(s)`);
    }
    expect(gaps).toEqual([]);
  });

  it('every record gives a squeeze, drop and stack margin with only the machine typed', () => {
    const failing = coverage.flatMap((c) =>
      COVERED_CHECKS.filter((k) => !c.runs[k]).map((k) => `${c.slug}: ${k}`),
    );
    expect(failing).toEqual([]);
  });

  it('every figure used names its rung, and a source unless it is typical', () => {
    for (const c of coverage)
      for (const f of c.figures) {
        expect(f.rung, `${c.slug} ${f.check} ${f.figure}`).not.toBe('missing');
        if (f.rung === 'own' || f.rung === 'commodity' || f.rung === 'derived')
          expect(f.source, `${c.slug} ${f.check} ${f.figure}`).toBeTruthy();
      }
  });

  it('reports the used figures per rung, the cultivars on their own data and the sources', async () => {
    const cultivars = coverage.filter((c) => !c.isCommodityRecord);
    const counts = rungCounts(cultivars);
    const total = Object.values(counts).reduce((a, b) => a + b, 0);
    const own = (slug: string) => records.find((r) => r.slug === slug)!.values;
    const withModulusAndThreshold = cultivars.filter((c) => {
      const v = own(c.slug).filter((x) => !x.isTypicalDefault);
      return (
        v.some((x) => x.quantity === 'youngs_modulus') &&
        v.some((x) =>
          [
            'static_bruise_threshold',
            'bioyield_stress',
            'failure_stress',
            'drop_threshold_height',
            'impact_threshold_energy',
          ].includes(x.quantity),
        )
      );
    });
    const typicalBy = new Map<string, number>();
    for (const c of cultivars)
      for (const f of c.figures)
        if (f.rung === 'typical')
          typicalBy.set(
            `${f.check}: ${f.figure}`,
            (typicalBy.get(`${f.check}: ${f.figure}`) ?? 0) + 1,
          );
    const ownData = Object.fromEntries(
      COVERED_CHECKS.map((k) => [
        k,
        cultivars.filter((c) =>
          c.figures
            .filter((f) => f.check === k)
            .every((f) => f.rung === 'own' || f.rung === 'derived'),
        ).length,
      ]),
    );
    const sources = await db('sources').select('kind');
    const values = await db('revision_values as v')
      .join('cultivars as c', 'c.published_revision_id', 'v.revision_id')
      .leftJoin('sources as s', 's.id', 'v.source_id')
      .select('s.kind', 'v.is_typical_default');
    const memory = values.filter((v) => v.kind === 'memory').length;
    console.log(
      [
        `records ${records.length} (cultivars ${cultivars.length})`,
        `used figures per rung over cultivars: ${JSON.stringify(counts)} of ${total}`,
        `typical share ${((counts.typical / total) * 100).toFixed(1)} %`,
        `cultivars with own modulus and a threshold: ${withModulusAndThreshold.length}`,
        `cultivars whose every figure is own or derived, per check: ${JSON.stringify(ownData)}`,
        `typical figures by check and figure: ${JSON.stringify(Object.fromEntries([...typicalBy].sort((a, b) => b[1] - a[1])))}`,
        `sources ${sources.length}; values ${values.length}, from memory ${memory} (${((memory / values.length) * 100).toFixed(1)} %)`,
      ].join('\n'),
    );
    // Every figure is on some rung (see above); the counts add up to the figures listed.
    expect(total).toBe(cultivars.reduce((a, c) => a + c.figures.length, 0));
    expect(counts.missing).toBe(0);
  });
});
