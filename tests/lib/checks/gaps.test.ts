import { describe, expect, it } from 'vitest';
import { checkSummaries, dataGaps, mostWanted, selectRows, type GapRow } from '@/lib/checks/gaps';
import type { Quantity } from '@/lib/properties/quantities';
import type { CultivarRecord, RevisionValue } from '@/lib/properties/records';

// Small knowledge bases built by hand; every expected rung below is worked out from the ladder
// (own → commodity record → derived → typical) by reading the values, not from the code.

const SOURCE = {
  ...{ id: 1, key: 'lab-2024', kind: 'paper' as const, authors: 'Lab, A.', year: 2024 },
  ...{ title: 'Plum tests', venue: null, pages: null, doi: null, url: null, note: null },
};

let nextId = 1;
function v(
  quantity: Quantity,
  variant: string,
  value: number,
  extra: Partial<RevisionValue> = {},
): RevisionValue {
  return {
    ...{ id: nextId++, quantity, variant, value, unit: '', low: null, high: null, sd: null },
    ...{ samples: null, method: null, ripeness: null, temperature: null, storage: null },
    ...{ loadingRate: null, probe: null, note: null, isTypicalDefault: false, stage: null },
    ...{ observation: null, typicalBasis: null, source: SOURCE },
    ...extra,
  };
}
const typical = (quantity: Quantity, variant: string, value: number) =>
  v(quantity, variant, value, {
    isTypicalDefault: true,
    typicalBasis: 'common practice',
    source: null,
  });

const PLUM = { id: 1, slug: 'plum', name: 'Plum', family: 'stone' };
const FIG = { id: 2, slug: 'fig', name: 'Fig', family: 'other' };
function record(
  slug: string,
  name: string,
  commodity: typeof PLUM,
  values: RevisionValue[],
  isType = false,
): CultivarRecord {
  return { id: nextId++, slug, name, isType, commodity, published: null, values };
}

// The plum commodity record: published modulus, size, density and pad friction; typical
// Poisson's ratio and threshold; no axial size, mass, drop figure or bin figures.
const plumType = record(
  'plum-type',
  'Plum (commodity record)',
  PLUM,
  [
    v('youngs_modulus', 'apparent', 5),
    typical('poisson_ratio', '', 0.3),
    v('diameter', 'equatorial', 40),
    v('density', '', 1000),
    typical('static_bruise_threshold', '', 100),
    v('friction_coefficient', 'steel', 0.5),
  ],
  true,
);
// Alpha: its own flesh modulus, axial size, mass and threshold; the rest inherited.
const alpha = record('plum-alpha', 'Alpha', PLUM, [
  v('youngs_modulus', 'flesh', 6),
  v('diameter', 'axial', 44),
  v('mass', '', 40),
  v('static_bruise_threshold', '', 120),
]);
// Beta: every figure of all three checks its own.
const beta = record('plum-beta', 'Beta', PLUM, [
  v('youngs_modulus', 'apparent', 4),
  v('poisson_ratio', '', 0.35),
  v('diameter', 'equatorial', 45),
  v('diameter', 'axial', 47),
  v('density', '', 950),
  v('static_bruise_threshold', '', 110),
  v('friction_coefficient', 'steel', 0.45),
  v('drop_threshold_height', 'steel', 300, { observation: 'no-bruise' }),
  v('bulk_density', '', 580),
  v('friction_coefficient', 'plywood', 0.4),
  v('lateral_pressure_ratio', '', 0.35),
]);
// Delta: only a bioyield stress and an angle of repose of its own, from which its threshold and
// its bin's lateral pressure ratio are derived.
const delta = record('plum-delta', 'Delta', PLUM, [
  v('bioyield_stress', '', 200),
  v('angle_of_repose', '', 32),
]);
// Gamma: a fig with only a Poisson's ratio and no commodity record: no check can run.
const gamma = record('fig-gamma', 'Gamma', FIG, [v('poisson_ratio', '', 0.3)]);

const ALL = [plumType, alpha, beta, delta, gamma];
const gaps = dataGaps(ALL);
const row = (slug: string) => gaps.rows.find((r) => r.slug === slug)!;
const rungs = (r: GapRow) =>
  Object.fromEntries(Object.entries(r.cells).map(([f, c]) => [f, c.rung]));

const FIGURES = [
  "Young's modulus",
  "Poisson's ratio",
  'Diameter',
  'Axial diameter',
  'Mass',
  'Density',
  'Static bruise threshold',
  'Friction against the pad',
  'Drop threshold onto steel',
  'Bulk density',
  'Wall friction',
  'Lateral pressure ratio',
];

describe('the data gaps matrix', () => {
  it('lists each figure the checks take once, in the checks’ order', () => {
    expect(gaps.figures).toEqual(FIGURES);
  });

  it('a commodity record’s published values are its own; a missing axial size is missing', () => {
    expect(rungs(row('plum-type'))).toEqual({
      "Young's modulus": 'own',
      "Poisson's ratio": 'typical',
      Diameter: 'own',
      'Axial diameter': 'missing',
      Mass: 'derived',
      Density: 'own',
      'Static bruise threshold': 'typical',
      'Friction against the pad': 'own',
      'Drop threshold onto steel': 'missing',
      'Bulk density': 'typical',
      'Wall friction': 'typical',
      'Lateral pressure ratio': 'typical',
    });
    // Mass from density and an assumed-round shape is not derived from own data only.
    expect(row('plum-type').cells.Mass.fromOwn).toBe(false);
    expect(row('plum-type').cells['Axial diameter'].note).toMatch(/take the fruit as round/);
    expect(row('plum-type').ownCount).toBe(4);
    expect(row('plum-type').cells["Young's modulus"].checks).toEqual(['squeeze', 'drop', 'stack']);
    expect(row('plum-type').cells['Friction against the pad'].checks).toEqual(['squeeze']);
  });

  it('a cultivar climbs to the commodity record, then to typical values', () => {
    expect(rungs(row('plum-alpha'))).toEqual({
      "Young's modulus": 'own',
      "Poisson's ratio": 'typical',
      Diameter: 'commodity',
      'Axial diameter': 'own',
      Mass: 'own',
      // Own mass is stronger than the commodity's density: density follows from the mass.
      Density: 'derived',
      'Static bruise threshold': 'own',
      'Friction against the pad': 'commodity',
      'Drop threshold onto steel': 'missing',
      'Bulk density': 'typical',
      'Wall friction': 'typical',
      'Lateral pressure ratio': 'typical',
    });
    expect(row('plum-alpha').cells.Density.fromOwn).toBe(false);
    expect(row('plum-alpha').ownCount).toBe(4);
    expect(row('plum-alpha').runs).toEqual({ squeeze: true, drop: true, stack: true });
    expect(row('plum-alpha').ownOnly).toEqual({ squeeze: false, drop: false, stack: false });
  });

  it('a record with every figure its own runs every check on own data', () => {
    const b = row('plum-beta');
    expect(Object.values(b.cells).every((c) => c.rung === 'own' || c.rung === 'derived')).toBe(
      true,
    );
    // Mass from its own density and both its own diameters.
    expect(b.cells.Mass).toMatchObject({ rung: 'derived', fromOwn: true });
    expect(b.ownCount).toBe(12);
    expect(b.ownOnly).toEqual({ squeeze: true, drop: true, stack: true });
  });

  it('a threshold derived from the cultivar’s own bioyield stress is own data', () => {
    expect(row('plum-delta').cells['Static bruise threshold']).toMatchObject({
      rung: 'derived',
      fromOwn: true,
    });
    // K = 1 − sin 32° = 0.470 from its own angle of repose (Jáky 1944).
    expect(row('plum-delta').cells['Lateral pressure ratio']).toMatchObject({
      rung: 'derived',
      fromOwn: true,
    });
    expect(row('plum-delta').ownCount).toBe(2);
  });

  it('a record the checks cannot resolve still shows every figure', () => {
    expect(rungs(row('fig-gamma'))).toEqual({
      "Young's modulus": 'missing',
      "Poisson's ratio": 'own',
      Diameter: 'missing',
      'Axial diameter': 'missing',
      Mass: 'missing',
      Density: 'missing',
      'Static bruise threshold': 'missing',
      'Friction against the pad': 'missing',
      'Drop threshold onto steel': 'missing',
      'Bulk density': 'typical',
      'Wall friction': 'typical',
      'Lateral pressure ratio': 'typical',
    });
    expect(row('fig-gamma').runs).toEqual({ squeeze: false, drop: false, stack: false });
  });
});

describe('the per-check summary', () => {
  it('counts cultivars (not commodity records) on own data only and at all', () => {
    // Alpha, Beta and Delta run (each has a threshold); only Beta on its own data; Gamma none.
    const expected = { ownOnly: 1, runs: 3, cultivars: 4 };
    expect(checkSummaries(gaps.rows)).toEqual([
      { check: 'squeeze', ...expected },
      { check: 'drop', ...expected },
      { check: 'stack', ...expected },
    ]);
  });
});

describe('the most wanted measurements', () => {
  const wanted = mostWanted(gaps.rows, 100);
  const find = (slug: string, figure: string) =>
    wanted.find((w) => w.slug === slug && w.figure === figure);

  it('ranks a commodity gap by its own inputs and every cultivar that inherits it', () => {
    // Plum Poisson's ratio: 3 checks for the record + 3 each for Alpha and Delta (typical).
    expect(wanted[0]).toMatchObject({
      slug: 'plum-type',
      figure: "Poisson's ratio",
      ownInputs: 3,
      inheritedInputs: 6,
      inheritingCultivars: 2,
      score: 9,
    });
    // Plum axial size: 3 + Delta's 3 (Alpha and Beta measured their own).
    expect(wanted[1]).toMatchObject({ slug: 'plum-type', figure: 'Axial diameter', score: 6 });
    // Drop onto steel: the drop check only, for the record, Alpha and Delta.
    expect(find('plum-type', 'Drop threshold onto steel')?.score).toBe(3);
  });

  it('leaves out own values and values derived from own ones', () => {
    expect(find('plum-alpha', 'Mass')).toBeUndefined();
    expect(find('plum-delta', 'Static bruise threshold')).toBeUndefined();
    expect(wanted.filter((w) => w.slug === 'plum-beta')).toEqual([]);
    // A cultivar's own gap counts its own inputs only.
    expect(find('plum-alpha', 'Diameter')).toMatchObject({ score: 3, inheritedInputs: 0 });
    expect(find('fig-gamma', 'Friction against the pad')?.score).toBe(1);
  });

  it('keeps the first n', () => {
    expect(mostWanted(gaps.rows, 2).map((w) => w.score)).toEqual([9, 6]);
  });
});

describe('sorting and filtering', () => {
  const slugs = (rows: GapRow[]) => rows.map((r) => r.slug);
  it('sorts by name (commodity, its record first) or by own values', () => {
    expect(slugs(selectRows(gaps.rows, {}))).toEqual([
      'fig-gamma',
      'plum-type',
      'plum-alpha',
      'plum-beta',
      'plum-delta',
    ]);
    expect(slugs(selectRows(gaps.rows, { sort: 'own' }))).toEqual([
      // Own figures: beta 12, the record 4, alpha 4, delta 2, gamma 1.
      'plum-beta',
      'plum-type',
      'plum-alpha',
      'plum-delta',
      'fig-gamma',
    ]);
  });

  it('filters by commodity and by a rung some cell is on', () => {
    expect(slugs(selectRows(gaps.rows, { commodity: 'fig' }))).toEqual(['fig-gamma']);
    expect(slugs(selectRows(gaps.rows, { rung: 'commodity' }))).toEqual([
      'plum-alpha',
      'plum-delta',
    ]);
  });
});
