import { describe, expect, it } from 'vitest';
import { createMonteCarlo, type SqueezeInput } from '@/fem';
import { fruitFromEvidence } from '@/lib/checks/fruit';
import { spreadsOf, type ResolvedSqueeze } from '@/lib/checks/squeeze/resolve';
import type { EvidenceSet } from '@/lib/evidence/ladder';
import type { RevisionValue } from '@/lib/properties/records';

// Weaker evidence widens the band the probability of bruising samples. Two hand-made fruits are
// identical except where Young's modulus comes from: the cultivar's own published 3.0 MPa with
// its source's SD of 0.1 MPa, or inherited from the commodity record (3.0 MPa) whose three
// records hold 2, 3 and 4 MPa, a sample SD of 1.0 MPa (by hand). Same seed, same samples.

let id = 1;
const v = (
  quantity: RevisionValue['quantity'],
  value: number,
  extra: Partial<RevisionValue> = {},
): RevisionValue => ({
  id: id++,
  quantity,
  variant: '',
  value,
  unit: '',
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
    key: 's',
    kind: 'paper',
    authors: 'A',
    year: 2000,
    title: 'T',
    venue: null,
    pages: null,
    doi: null,
    url: null,
    note: null,
  },
  ...extra,
});

const common = [
  v('poisson_ratio', 0.35),
  v('diameter', 70, { variant: 'equatorial' }),
  v('diameter', 70, { variant: 'axial' }),
  v('density', 850),
  v('static_bruise_threshold', 150),
  v('friction_coefficient', 0.5, { variant: 'steel' }),
];
const ownModulus = v('youngs_modulus', 3, { variant: 'apparent', sd: 0.1 });
const typeModulus = v('youngs_modulus', 3, { variant: 'apparent' });

function resolved(set: EvidenceSet): ResolvedSqueeze {
  const fruit = fruitFromEvidence(null, set, {});
  const friction = {
    value: 0.5,
    unit: '–',
    rung: 'commodity' as const,
    source: 'A 2000',
    note: null,
    low: null,
    high: null,
    sd: null,
    spread: null,
  };
  const model: SqueezeInput = {
    equatorialRadius: 0.035,
    axialRadius: 0.035,
    modulus: fruit.modulusMpa.value * 1e6,
    poisson: fruit.poisson.value,
    travel: 0.003,
    mesh: 'sparse',
    padDiameter: 0.02,
    edgeRadius: 0.002,
    density: fruit.densityKgM3.value,
    friction: 0.5,
    safetyFactor: 2,
    accelG: 0,
    bruiseThreshold: fruit.staticThresholdKpa!.value * 1000,
  };
  const relaxation = null;
  return {
    fruit,
    density: fruit.densityKgM3,
    friction,
    failureStress: null,
    relaxation,
    maxTravelMm: 2,
    maxTravelAuto: false,
    axialMm: 70,
    model,
  };
}

describe('spreads follow the evidence', () => {
  const own = resolved({
    commodityName: 'Apple',
    own: [ownModulus],
    commodity: common,
    across: [[ownModulus], common],
    stage: null,
  });
  const inherited = resolved({
    commodityName: 'Apple',
    own: [],
    commodity: [typeModulus, ...common],
    across: [
      [v('youngs_modulus', 2, { variant: 'apparent' })],
      [typeModulus, ...common],
      [v('youngs_modulus', 4, { variant: 'apparent' })],
    ],
    stage: null,
  });

  it('an inherited modulus samples from the spread across the commodity, an own one from its source', () => {
    expect(own.fruit.modulusMpa.rung).toBe('own');
    expect(inherited.fruit.modulusMpa.rung).toBe('commodity');
    expect(spreadsOf(own).spreads.modulus).toEqual({ sd: 0.1e6 });
    expect(spreadsOf(inherited).spreads.modulus).toEqual({ sd: 1e6 });
  });

  it('so the same seed gives a wider band of the margin for the inherited one', () => {
    const run = (r: ResolvedSqueeze) => {
      const mc = createMonteCarlo({
        base: r.model,
        spreads: spreadsOf(r).spreads,
        samples: 200,
        seed: 11,
      });
      mc.step(200);
      return mc.result(false);
    };
    const a = run(own);
    const b = run(inherited);
    const width = (m: typeof a) => m.margin!.p95 - m.margin!.p05;
    // The nominal case is the same fruit, so the nominal margins agree exactly.
    expect(b.nominalMargin).toBe(a.nominalMargin);
    // Ten times the modulus SD: the 5–95 % band of the margin must be clearly wider (at least
    // twice; the threshold's and the size's spreads, the same in both, add to both bands).
    expect(width(b)).toBeGreaterThan(2 * width(a));
  });
});
