import { beforeAll, describe, expect, it } from 'vitest';
import { freshDatabase } from '../support/db';
import { db } from '@/lib/db';
import { QUANTITIES, isQuantity } from '@/lib/properties/quantities';
import { revisionValueSchema } from '@/lib/validation/revisions';

interface PublishedValue {
  slug: string;
  name: string;
  is_type: number | boolean;
  quantity: string;
  variant: string;
  value: number;
  unit: string;
  low: number | null;
  high: number | null;
  note: string | null;
  is_typical_default: number | boolean;
  typical_basis: string | null;
  observation: string | null;
  source_key: string | null;
  source_kind: string | null;
}

/** Every value of every cultivar's published revision, with its source. */
async function publishedValues(): Promise<PublishedValue[]> {
  return db('cultivars as c')
    .join('revision_values as v', 'v.revision_id', 'c.published_revision_id')
    .leftJoin('sources as s', 's.id', 'v.source_id')
    .select(
      'c.slug',
      'c.name',
      'c.is_type',
      'v.quantity',
      'v.variant',
      'v.value',
      'v.unit',
      'v.low',
      'v.high',
      'v.note',
      'v.is_typical_default',
      'v.typical_basis',
      'v.observation',
      's.key as source_key',
      's.kind as source_kind',
    )
    .orderBy(['c.slug', 'v.position']);
}

let values: PublishedValue[];
const of = (slug: string, quantity: string, variant = '') =>
  values.filter((v) => v.slug === slug && v.quantity === quantity && v.variant === variant);

describe('the seeded property database', () => {
  beforeAll(async () => {
    await freshDatabase();
    values = await publishedValues();
  });

  it('holds at least 12 commodities and 20 cultivars, each with a published revision', async () => {
    const commodities = await db('commodities').select('family', 'botanical_name');
    expect(commodities.length).toBeGreaterThanOrEqual(12);
    for (const c of commodities) expect(c.family && c.botanical_name).toBeTruthy();
    const cultivars = await db('cultivars as c')
      .leftJoin('property_revisions as r', 'r.id', 'c.published_revision_id')
      .select('c.slug', 'r.status');
    expect(cultivars.length).toBeGreaterThanOrEqual(20);
    for (const c of cultivars) expect(c.status, c.slug).toBe('published');
  });

  it('gives every measured value a source and the unit of its quantity', () => {
    for (const v of values.filter((x) => !x.is_typical_default)) {
      const where = `${v.slug} ${v.quantity} ${v.variant}`;
      expect(v.source_key, where).not.toBeNull();
      expect(isQuantity(v.quantity), where).toBe(true);
      expect(v.unit, where).toBe(QUANTITIES[v.quantity as keyof typeof QUANTITIES].unit);
    }
  });

  it('keeps typical values unsourced, labelled with their basis and what was searched', () => {
    const defaults = values.filter((v) => v.is_typical_default);
    expect(defaults.length).toBeGreaterThan(0);
    for (const v of defaults) {
      const where = `${v.slug} ${v.quantity} ${v.variant}`;
      expect(v.source_key, where).toBeNull();
      expect(['common practice', 'from memory'], where).toContain(v.typical_basis);
      expect(v.note?.length ?? 0, where).toBeGreaterThan(40);
    }
  });

  it('every drop and impact figure says what was observed, and names a surface from the list', () => {
    const drops = values.filter((v) =>
      ['drop_threshold_height', 'impact_threshold_energy'].includes(v.quantity),
    );
    expect(drops.length).toBeGreaterThan(10);
    for (const v of drops) {
      const where = `${v.slug} ${v.quantity} ${v.variant}`;
      expect(['no-bruise', 'bruised-at', 'recommended-max'], where).toContain(v.observation);
      expect(v.variant, where).not.toBe('');
    }
  });

  it('names a cultivar only where a non-demo source measured it', async () => {
    const named = await db('cultivars').where({ is_type: false }).select('slug');
    expect(named.length).toBeGreaterThanOrEqual(20);
    for (const { slug } of named) {
      const measured = values.filter(
        (v) => v.slug === slug && v.source_kind && v.source_kind !== 'demo',
      );
      expect(measured.length, slug).toBeGreaterThan(0);
    }
  });

  it('publishes no demo values; the count of sources and values by kind', async () => {
    expect(values.filter((v) => v.source_kind === 'demo')).toEqual([]);
    const kinds = (await db('sources').select('kind')).map((s) => String(s.kind));
    const table = [...new Set(kinds)].sort().map((kind) => ({
      kind,
      sources: kinds.filter((k) => k === kind).length,
      'published values': values.filter((v) => v.source_kind === kind).length,
    }));
    table.push({
      kind: '(typical default)',
      sources: 0,
      'published values': values.filter((v) => v.is_typical_default).length,
    });
    console.log('Seeded sources and published values by source kind');
    console.table(table);
    expect(table.find((t) => t.kind === 'paper')!.sources).toBeGreaterThan(10);
  });

  it('keeps demo revisions out of the published record, labelled and valid', async () => {
    const demos = await db('property_revisions as r')
      .join('cultivars as c', 'c.id', 'r.cultivar_id')
      .where('r.is_demo', true)
      .select('r.*', 'c.published_revision_id');
    expect(demos.length).toBeGreaterThanOrEqual(2);
    expect(new Set(demos.map((d) => d.status))).toEqual(new Set(['in_review', 'returned']));
    for (const d of demos) {
      expect(d.summary).toMatch(/^Demo:/);
      expect(d.based_on_id).toBe(d.published_revision_id);
      if (d.status === 'returned') expect(d.review_comment).toMatch(/^Demo:/);
      const rows = await db('revision_values as v')
        .leftJoin('sources as s', 's.id', 'v.source_id')
        .where('v.revision_id', d.id)
        .select('v.*', 's.key as source_key', 's.kind as source_kind');
      expect(rows.some((r) => r.source_kind === 'demo')).toBe(true);
      for (const r of rows) {
        const check = revisionValueSchema.safeParse({
          ...r,
          loadingRate: r.loading_rate,
          isTypicalDefault: Boolean(r.is_typical_default),
          sourceKey: r.source_key,
        });
        expect(check.success, `${d.id} ${r.quantity}`).toBe(true);
      }
    }
    // Seeding again adds no second set.
    await db.seed.run();
    const [{ n }] = await db('property_revisions').where({ is_demo: true }).count({ n: '*' });
    expect(Number(n)).toBe(demos.length);
  });
});

describe('seeded figures against the published numbers', () => {
  // Exact where a value is stored as published (or converted by a power of ten): no tolerance.
  it('kiwifruit flesh: E 0.288 MPa, bio-yield 24 kPa, 1022 kg/m³ (Du et al. 2019, ASABE 1900242)', () => {
    expect(of('kiwifruit-type', 'youngs_modulus', 'flesh')[0].value).toBe(0.288);
    // A bioyield stress, stored as one (it was filed as a failure stress before).
    expect(of('kiwifruit-type', 'bioyield_stress')[0]).toMatchObject({
      value: 24,
      source_key: 'du-2019-asabe',
    });
    expect(of('kiwifruit-type', 'failure_stress')).toEqual([]);
    const flesh = of('kiwifruit-type', 'density').find((v) => v.source_key === 'du-2019-asabe');
    expect(flesh?.value).toBe(1022);
  });

  it('Jonathan flesh E 2.52 MPa (2.36–3.28) through storage (Shahabasi 1979, MSU thesis)', () => {
    expect(of('apple-jonathan', 'youngs_modulus', 'flesh')[0]).toMatchObject({
      value: 2.52,
      low: 2.36,
      high: 3.28,
      unit: 'MPa',
    });
    expect(of('apple-jonathan', 'failure_stress')[0]).toMatchObject({ value: 252, unit: 'kPa' });
  });

  it('apple: no bruise below 0.10 MPa = 100 kPa (Wang, Wang & Wu 2024, Processes 12:543)', () => {
    expect(of('apple-type', 'static_bruise_threshold')[0]).toMatchObject({
      value: 100,
      unit: 'kPa',
    });
  });

  it('friction angles become μ = tan θ (Sharifi et al. 2007; Meisami-asl et al., CIGR Journal)', () => {
    // Tolerance 0.001: μ is stored to three decimals; tan 20.2° = 0.3679…, tan 26.8° = 0.5051…
    const thompson = of('orange-thompson', 'friction_coefficient', 'galvanised steel')[0];
    expect(Math.abs(thompson.value - 0.368)).toBeLessThanOrEqual(0.001);
    const golab = of('apple-golab', 'friction_coefficient', 'plywood')[0];
    expect(Math.abs(golab.value - 0.505)).toBeLessThanOrEqual(0.001);
    expect(thompson.note).toContain('20.2°');
  });

  it('drop figures keep what was observed (Stropek & Gołacki 2022; Moggia et al. 2017)', () => {
    // 'Ramos' began to bruise at 1 m/s onto a rigid plate, about 50 mm: bruised at, an upper bound.
    expect(of('potato-ramos', 'drop_threshold_height', 'rigid plate')[0]).toMatchObject({
      value: 50,
      observation: 'bruised-at',
    });
    // The blueberries were dropped 32 cm onto hard plastic to damage them: not a safe height.
    expect(of('blueberry-brigitta', 'drop_threshold_height', 'hard plastic')[0]).toMatchObject({
      value: 320,
      observation: 'bruised-at',
    });
    // Guessed impactors are gone: no drop figure of Royal Gala (its report names none) or Hass.
    expect(
      values.filter((v) => v.slug === 'apple-royal-gala' || v.slug === 'avocado-hass'),
    ).toEqual([]);
  });

  it('banana pulp specific gravity 0.993 → 993 kg/m³ (Kachru et al. 1995, J. Food Eng. 26:369)', () => {
    expect(of('banana-dwarf-cavendish', 'density')[0].value).toBe(993);
  });

  it('conflicting sources stand side by side on one page', () => {
    // Sweet orange grade II 0.16 (bulk-handling study) against 'Phule Mosambi' 0.45 (HortFlora).
    const steel = of('orange-type', 'friction_coefficient', 'mild steel');
    expect(steel.map((v) => [v.value, v.source_key])).toEqual([
      [0.16, 'sweet-orange-bulk-handling'],
      [0.45, 'hortflora-mosambi-kinnow'],
    ]);
    // Apple Poisson's ratio: 0.382–0.390 measured (Konya study) against 0.2–0.35 recalled.
    const poisson = of('apple-type', 'poisson_ratio');
    expect(poisson.map((v) => [v.low, v.high, v.source_kind])).toEqual([
      [0.382, 0.39, 'paper'],
      [0.2, 0.35, 'memory'],
    ]);
    // Kiwifruit density: whole 'Hayward' fruit 1093 (secondary) beside the flesh 1022 (Du 2019).
    const kiwi = of('kiwifruit-type', 'density').map((v) => v.value);
    expect(kiwi).toContain(1093);
    expect(kiwi).toContain(1022);
  });
});
