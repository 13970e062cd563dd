import { describe, expect, it } from 'vitest';
import { climb, derivedValue, pickForStage, type EvidenceSet } from '@/lib/evidence/ladder';
import { MASS_FROM_SIZE } from '@/lib/evidence/relations';
import { restsOn, weakestRung } from '@/lib/evidence/rungs';
import { enteredValue, usedValueSchema } from '@/lib/evidence/used';
import type { RevisionValue } from '@/lib/properties/records';

// Hand-made records: every expected value below is read off these fixtures, not the ladder.
let nextId = 1;
function value(
  partial: Partial<RevisionValue> & Pick<RevisionValue, 'quantity' | 'value'>,
): RevisionValue {
  return {
    id: nextId++,
    variant: '',
    unit: 'MPa',
    low: null,
    high: null,
    sd: null,
    samples: null,
    method: null,
    ripeness: null,
    temperature: null,
    storage: null,
    loadingRate: null,
    probe: null,
    note: null,
    isTypicalDefault: false,
    stage: null,
    observation: null,
    typicalBasis: null,
    source: {
      id: 1,
      key: 'k',
      kind: 'paper',
      authors: 'Author, A.; Other, B.',
      year: 2001,
      title: 'T',
      venue: null,
      pages: null,
      doi: null,
      url: null,
      note: null,
    },
    ...partial,
  };
}

const set = (
  own: RevisionValue[],
  commodity: RevisionValue[],
  across: RevisionValue[][] = [],
  stage: EvidenceSet['stage'] = null,
): EvidenceSet => ({
  commodityName: 'Apple',
  own,
  commodity,
  across: across.length ? across : [own, commodity],
  stage,
});

const E = { quantity: 'youngs_modulus' as const, variants: ['apparent', 'flesh'] };

describe('the evidence ladder', () => {
  const own = value({
    quantity: 'youngs_modulus',
    variant: 'flesh',
    value: 2.5,
    low: 2.3,
    high: 3.3,
  });
  const commodity = value({ quantity: 'youngs_modulus', variant: 'apparent', value: 2.0 });

  it('rung 5 first: what the user typed wins over every record', () => {
    const c = climb(set([own], [commodity]), E, { entered: 4, unit: 'MPa' })!;
    expect(c.used).toEqual(enteredValue(4, 'MPa'));
    expect(c.used.rung).toBe('entered');
  });

  it("rung 1: the cultivar's own value beats the commodity's, whatever the variant order", () => {
    const c = climb(set([own], [commodity]), E, { unit: 'MPa' })!;
    expect(c.used).toMatchObject({
      value: 2.5,
      rung: 'own',
      source: 'Author 2001',
      low: 2.3,
      high: 3.3,
    });
  });

  it('within a rung the preferred variant comes first', () => {
    const apparent = value({ quantity: 'youngs_modulus', variant: 'apparent', value: 1.8 });
    expect(climb(set([own, apparent], []), E, { unit: 'MPa' })!.used.value).toBe(1.8);
  });

  it("rung 2: the commodity record's value, with the spread across the commodity's records", () => {
    // Three records of the commodity hold 1, 2 and 3 MPa: sample SD 1 MPa (by hand).
    const across = [
      [value({ quantity: 'youngs_modulus', value: 1, variant: 'apparent' })],
      [commodity],
      [value({ quantity: 'youngs_modulus', value: 3, variant: 'apparent' })],
    ];
    const c = climb(set([], [commodity], across), E, { unit: 'MPa' })!;
    expect(c.used).toMatchObject({ value: 2, rung: 'commodity', sd: 1, low: null, high: null });
    expect(c.used.spread).toContain('3 apple figures');
    expect(c.used.note).toContain('Inherited from the apple commodity record');
  });

  it('rung 3: a derived value when neither record has the figure', () => {
    const derived = derivedValue(
      MASS_FROM_SIZE,
      180,
      'g',
      {
        density: enteredValue(1000, 'kg/m³'),
        equatorial: enteredValue(70, 'mm'),
        axial: enteredValue(70, 'mm'),
      },
      'by hand',
    );
    const c = climb(set([], []), { quantity: 'mass' }, { unit: 'g', derive: () => derived })!;
    expect(c.used.rung).toBe('derived');
    expect(c.used.value).toBe(180);
  });

  it('rung 4: a stored typical value, with a ±30 % band when it stores none', () => {
    const typical = value({
      quantity: 'poisson_ratio',
      value: 0.35,
      isTypicalDefault: true,
      typicalBasis: 'common practice',
      source: null,
    });
    const c = climb(set([], [typical]), { quantity: 'poisson_ratio' }, { unit: '–' })!;
    // 0.35 × 0.7 = 0.245 and 0.35 × 1.3 = 0.455 (by hand).
    expect(c.used).toMatchObject({
      rung: 'typical',
      low: 0.245,
      high: 0.455,
      source: 'common practice, no single source',
    });
  });

  it('a published value on any rung above outranks a typical one on the own record', () => {
    const typical = value({
      quantity: 'poisson_ratio',
      value: 0.35,
      isTypicalDefault: true,
      typicalBasis: 'from memory',
      source: null,
    });
    const published = value({ quantity: 'poisson_ratio', value: 0.3 });
    expect(
      climb(set([typical], [published]), { quantity: 'poisson_ratio' }, { unit: '–' })!.used,
    ).toMatchObject({ rung: 'commodity', value: 0.3 });
  });

  it("last the check's own typical value, then nothing", () => {
    expect(climb(set([], []), { quantity: 'bulk_density' }, { unit: 'kg/m³' })).toBeNull();
  });

  it('takes the chosen stage; a value from another stage only with a warning that says so', () => {
    const firm = value({
      quantity: 'youngs_modulus',
      variant: 'apparent',
      value: 3,
      stage: 'firm',
    });
    const ripe = value({
      quantity: 'youngs_modulus',
      variant: 'apparent',
      value: 1,
      stage: 'ripe',
    });
    expect(pickForStage([firm, ripe], 'ripe')).toEqual({ value: ripe, note: null });
    const other = pickForStage([firm], 'ripe')!;
    expect(other.value).toBe(firm);
    expect(other.note).toMatch(/firm \(harvest\) fruit, not on ripe \(eating\) fruit/);
    const c = climb(set([firm], [], [], 'ripe'), E, { unit: 'MPa' })!;
    expect(c.used.note).toMatch(/not on ripe/);
  });

  it('the weakest rung names what the verdict rests on; typed figures are the user’s own', () => {
    expect(weakestRung(['own', 'commodity', 'typical', 'entered'])).toBe('typical');
    expect(weakestRung(['own', 'derived'])).toBe('derived');
    expect(weakestRung(['entered'])).toBeNull();
    expect(restsOn('commodity', ['the bruise threshold'])).toBe(
      'rests on a commodity value for the bruise threshold',
    );
  });

  it('reads a result saved before the ladder (origin) as the rung it meant', () => {
    const old = {
      value: 2,
      unit: 'MPa',
      origin: 'published',
      source: 'X 1999',
      low: null,
      high: null,
      sd: null,
    };
    expect(usedValueSchema.parse(old)).toMatchObject({ rung: 'own', note: null, spread: null });
    expect(usedValueSchema.parse({ ...old, origin: 'typical default' }).rung).toBe('typical');
  });
});
