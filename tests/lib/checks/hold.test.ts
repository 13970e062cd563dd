import { describe, expect, it } from 'vitest';
import { siText } from '@/lib/phrase';
import { runSqueeze, type SqueezeInput } from '@/fem';
import { holdJson, holdWarnings, relaxationOf } from '@/lib/checks/squeeze/hold';
import type { EvidenceSet } from '@/lib/evidence/ladder';
import type { RevisionValue } from '@/lib/properties/records';

// A 70 mm fruit between flat pads; figures invented for the test, not for any cultivar.
const input: SqueezeInput = {
  equatorialRadius: 0.035,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.004,
  mesh: 'sparse',
  density: 1000,
  friction: 0.5,
  safetyFactor: 2,
  accelG: 0,
  bruiseThreshold: 250e3,
};
const relax = { k1: 20, k2: 1.25 };

describe('the held grip', () => {
  const grip = runSqueeze(input).liftability!.grip!;
  const held = holdJson(input, { seconds: 30, relaxation: relax }, grip.force);

  it('slips when the relaxation has used up the safety factor (hand calculation)', () => {
    // Peleg: ψ(30) = 1 − 30/(20 + 1.25·30) = 0.47826. With SF 2 the fruit really slips at
    // ψ = 1/2: t = 0.5·20/(1 − 0.5·1.25) = 26.667 s. Tolerance: the 4 digits the answer keeps.
    expect(held.retained_at_end).toBeCloseTo(0.4783, 4);
    expect(held.safety_at_end).toBeCloseTo(0.9565, 4);
    expect(held.grip_slips_after_s).toBeCloseTo(26.67, 2);
    expect(holdWarnings(held).map(siText).join(' ')).toMatch(
      /used up after 26\.67 s and the fruit slips/,
    );
  });

  it('finds the travel that still lifts with the safety factor at the end of the hold', () => {
    const h = held.held!;
    // Independently: the force at that travel from a fresh run, times ψ(T), against the grip
    // rule 2μF ≥ SF·m·g with m = ρ·(4/3)πR³ worked here. Tolerance 1e-4: the grip search stops
    // within 1e-5 of the travel and the answer keeps 4 digits.
    const F0 = runSqueeze({ ...input, travel: h.travel_per_pad_mm / 1000, steps: 1 }).final.force;
    const m = 1000 * (4 / 3) * Math.PI * 0.035 ** 3;
    const need = (2 * m * 9.80665) / (2 * 0.5);
    expect(Math.abs((F0 * 0.47826) / need - 1)).toBeLessThan(1e-3);
    expect(Math.abs(h.force_n / F0 - 1)).toBeLessThan(1e-3);
    // Deeper than the grip at t = 0, and so a higher first pressure and a lower bruise margin.
    expect(h.travel_per_pad_mm).toBeGreaterThan(grip.travel * 1000);
    expect(h.bruise_margin!).toBeLessThan(grip.bruiseMargin!);
    expect(h.force_end_n).toBeCloseTo(h.force_n * 0.47826, 1);
  });

  it('draws force and lift ratio against time, the held curve ending at the safety factor', () => {
    const c = held.curve!;
    expect(c[0]).toMatchObject({ t_s: 0, grip_lift_ratio: 1 });
    expect(c[c.length - 1].t_s).toBe(30);
    // The held travel's ratio (to the design load) ends at 1 by construction of the search;
    // the grip point's falls to ψ(30). Tolerance: 4 digits.
    expect(c[c.length - 1].held_lift_ratio).toBeCloseTo(1, 3);
    expect(c[c.length - 1].grip_lift_ratio).toBeCloseTo(0.4783, 4);
    for (let i = 1; i < c.length; i++)
      expect(c[i].held_force_n!).toBeLessThan(c[i - 1].held_force_n!);
  });

  it('says so, and invents nothing, without relaxation data', () => {
    const none = holdJson(input, { seconds: 5, relaxation: null }, grip.force);
    expect(none).toMatchObject({
      relaxation: false,
      curve: null,
      held: null,
      retained_at_end: null,
    });
    expect(siText(holdWarnings(none)[0])).toMatch(/No relaxation data for this fruit on any rung/);
  });
});

describe('the relaxation pair from the ladder', () => {
  const src = (id: number) => ({
    ...{ id, key: `s${id}`, kind: 'paper' as const, authors: 'A', year: 2020, title: 't' },
    ...{ venue: null, pages: null, doi: null, url: null, note: null },
  });
  let id = 1;
  const v = (
    quantity: 'relaxation_k1' | 'relaxation_k2',
    value: number,
    source: number,
  ): RevisionValue => ({
    ...{ id: id++, quantity, variant: '', value, unit: '', low: null, high: null, sd: null },
    ...{ samples: null, method: null, ripeness: null, temperature: null, storage: null },
    ...{ loadingRate: null, probe: null, note: null, isTypicalDefault: false, stage: null },
    ...{ observation: null, typicalBasis: null, source: src(source) },
  });
  const set = (own: RevisionValue[], commodity: RevisionValue[]): EvidenceSet => ({
    commodityName: 'Apple',
    own,
    commodity,
    across: [own, commodity],
    stage: null,
  });

  it('takes k₁ and k₂ of one source on one rung, and never mixes them', () => {
    const own = relaxationOf(set([v('relaxation_k1', 15, 1), v('relaxation_k2', 1.4, 1)], []));
    expect(own).toMatchObject({ k1: { value: 15, rung: 'own' }, k2: { value: 1.4, rung: 'own' } });
    // k₁ of the cultivar with k₂ of the commodity record (another test): no pair.
    expect(relaxationOf(set([v('relaxation_k1', 15, 1)], [v('relaxation_k2', 1.4, 2)]))).toBeNull();
    // Both on the commodity record, same source: the commodity's pair.
    expect(
      relaxationOf(set([], [v('relaxation_k1', 30, 3), v('relaxation_k2', 1.2, 3)])),
    ).toMatchObject({ k1: { rung: 'commodity' }, k2: { rung: 'commodity' } });
    expect(relaxationOf(set([], []))).toBeNull();
  });
});
