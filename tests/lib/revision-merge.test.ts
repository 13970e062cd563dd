import { describe, expect, it } from 'vitest';
import { mergeRevisionValues, type StoredValue } from '@/lib/data/revision-merge';

/** A hand-made stored value: only what a case needs differs from a plain sourced figure. */
function v(quantity: string, value: number, extra: Partial<StoredValue> = {}): StoredValue {
  return {
    quantity,
    variant: '',
    value,
    unit: quantity === 'static_bruise_threshold' ? 'kPa' : 'MPa',
    low: null,
    high: null,
    sd: null,
    samples: null,
    method: null,
    ripeness: null,
    temperature: null,
    storage: null,
    loading_rate: null,
    probe: null,
    note: null,
    is_typical_default: 0,
    stage: null,
    observation: null,
    typical_basis: null,
    source_id: 1,
    ...extra,
  };
}

const modulus = (value: number, extra: Partial<StoredValue> = {}) =>
  v('youngs_modulus', value, { variant: 'apparent', ...extra });
const threshold = (value: number, extra: Partial<StoredValue> = {}) =>
  v('static_bruise_threshold', value, extra);
const figures = (vs: StoredValue[]) => vs.map((x) => [x.quantity, x.value, x.source_id]);

describe('three-way merge of a draft onto a newer published revision', () => {
  it('the Williams case: the draft adds a modulus, upstream adds 120 kPa; both are kept', () => {
    const base = [modulus(1.68)];
    const mine = [modulus(1.68), modulus(1.42, { source_id: 9, sd: 0.21 })];
    const theirs = [modulus(1.68), threshold(120, { source_id: 4 })];
    const r = mergeRevisionValues(base, mine, theirs);
    expect(figures(r.merged)).toEqual([
      ['youngs_modulus', 1.68, 1],
      ['youngs_modulus', 1.42, 9],
      ['static_bruise_threshold', 120, 4],
    ]);
    expect(r.conflicts).toEqual([]);
    expect(r.carried.map((c) => [c.label, c.before, c.after?.value])).toEqual([
      ['Static bruise threshold', null, 120],
    ]);
  });

  it('an upstream change or removal of a value the draft left alone is carried in', () => {
    const base = [modulus(1.68), threshold(90), v('poisson_ratio', 0.3, { unit: '–' })];
    const mine = [modulus(1.5), threshold(90), v('poisson_ratio', 0.3, { unit: '–' })];
    const theirs = [modulus(1.68), threshold(95)];
    const r = mergeRevisionValues(base, mine, theirs);
    expect(figures(r.merged)).toEqual([
      ['youngs_modulus', 1.5, 1],
      ['static_bruise_threshold', 95, 1],
    ]);
    expect(r.conflicts).toEqual([]);
    expect(
      r.carried.map((c) => [c.label, c.before?.value ?? null, c.after?.value ?? null]),
    ).toEqual([
      ['Static bruise threshold', 90, 95],
      ["Poisson's ratio", 0.3, null],
    ]);
  });

  it('a value both changed differently is a conflict; the draft keeps its own until decided', () => {
    const base = [threshold(90)];
    const mine = [threshold(110)];
    const theirs = [threshold(120)];
    const r = mergeRevisionValues(base, mine, theirs);
    expect(figures(r.merged)).toEqual([['static_bruise_threshold', 110, 1]]);
    expect(r.conflicts).toHaveLength(1);
    expect(r.conflicts[0]).toMatchObject({
      label: 'Static bruise threshold',
      base: { value: 90 },
      mine: { value: 110 },
      theirs: { value: 120 },
    });
  });

  it('removed on one side and changed on the other is a conflict too, both ways round', () => {
    const base = [threshold(90), modulus(1.68)];
    const r = mergeRevisionValues(base, [modulus(1.68)], [threshold(95), modulus(2)]);
    expect(r.conflicts.map((c) => [c.mine?.value ?? null, c.theirs?.value ?? null])).toEqual([
      [null, 95],
    ]);
    // The modulus only upstream changed: carried in beside the conflict.
    expect(figures(r.merged)).toEqual([['youngs_modulus', 2, 1]]);
    const back = mergeRevisionValues(base, [threshold(95), modulus(1.68)], [modulus(1.68)]);
    expect(back.conflicts.map((c) => [c.mine?.value ?? null, c.theirs?.value ?? null])).toEqual([
      [95, null],
    ]);
  });

  it('the same change on both sides, or both adding the same value, is no conflict', () => {
    const base = [threshold(90)];
    const r = mergeRevisionValues(base, [threshold(95), modulus(2)], [threshold(95), modulus(2)]);
    expect(figures(r.merged)).toEqual([
      ['static_bruise_threshold', 95, 1],
      ['youngs_modulus', 2, 1],
    ]);
    expect(r.conflicts).toEqual([]);
    expect(r.carried).toEqual([]);
  });

  it('values differ by source and conditions: two sources in one slot never collide', () => {
    const base: StoredValue[] = [];
    const mine = [threshold(110, { source_id: 2 })];
    const theirs = [
      threshold(120, { source_id: 3 }),
      threshold(80, { source_id: 3, stage: 'ripe' }),
    ];
    const r = mergeRevisionValues(base, mine, theirs);
    expect(r.conflicts).toEqual([]);
    expect(figures(r.merged)).toEqual([
      ['static_bruise_threshold', 110, 2],
      ['static_bruise_threshold', 120, 3],
      ['static_bruise_threshold', 80, 3],
    ]);
  });

  it('repeated identical identities are matched in order, and SQLite 0/1 equals a boolean', () => {
    const base = [threshold(90), threshold(91)];
    const mine = [threshold(90, { is_typical_default: false }), threshold(93)];
    const theirs = [threshold(92), threshold(91)];
    const r = mergeRevisionValues(base, mine, theirs);
    expect(r.merged.map((x) => x.value)).toEqual([92, 93]);
    expect(r.conflicts).toEqual([]);
  });
});
