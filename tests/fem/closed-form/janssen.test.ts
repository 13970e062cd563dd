import { describe, expect, it } from 'vitest';
import {
  janssenAsymptoticPressure,
  janssenMaxFillDepth,
  janssenVerticalPressure,
  rectangularBinHydraulicRadius,
  type JanssenBin,
} from '../../../fem/closed-form';
import { expectFieldError, expectRelative } from './expect-close';

const G = 9.80665;
// Invented inputs spanning fruit bins (bulk density, size, wall friction, K); not data.
const BINS: JanssenBin[] = [
  { bulkDensity: 500, hydraulicRadius: 0.27, wallFriction: 0.4, lateralRatio: 0.5 },
  { bulkDensity: 650, hydraulicRadius: 0.1, wallFriction: 0.45, lateralRatio: 0.3 },
  { bulkDensity: 420, hydraulicRadius: 0.6, wallFriction: 0.2, lateralRatio: 0.7, g: 9.7 },
  { bulkDensity: 800, hydraulicRadius: 0.05, wallFriction: 0.6, lateralRatio: 0.9 },
];
const decayLength = (b: JanssenBin) => b.hydraulicRadius / (b.wallFriction * b.lateralRatio);

describe('janssenVerticalPressure', () => {
  it('tends to ρ_b g z near the top', () => {
    // H. A. Janssen, Versuche über Getreidedruck in Silozellen, Z. Ver. Dtsch. Ing. 39, 1895
    // [from memory]: σ_v = ρ_b g L (1 − e^(−z/L)), L = R_h/(μ_w K), so σ_v → ρ_b g z as z → 0. At z = 1e-4 of the
    // decay length R_h/(μK) the first neglected term is z/(2L) = 5e-5; tolerance 1e-4.
    for (const bin of BINS) {
      const depth = 1e-4 * decayLength(bin);
      const hydrostatic = bin.bulkDensity * (bin.g ?? G) * depth;
      expectRelative(janssenVerticalPressure({ ...bin, depth }), hydrostatic, 1e-4);
    }
  });

  it('tends to ρ_b g R_h/(μ_w K) deep down, from below', () => {
    // Janssen 1895 [from memory]: σ_v → ρ_b g L from below as z → ∞. At 40 decay lengths e^(−40) ≈ 4e-18, so the
    // pressure equals the limit to round-off (1e-12) and never exceeds it at any depth.
    for (const bin of BINS) {
      const limit = bin.bulkDensity * (bin.g ?? G) * decayLength(bin);
      expectRelative(janssenAsymptoticPressure(bin), limit, 1e-12);
      expectRelative(
        janssenVerticalPressure({ ...bin, depth: 40 * decayLength(bin) }),
        limit,
        1e-12,
      );
      for (const depth of [0.1, 1, 3, 10]) {
        expect(janssenVerticalPressure({ ...bin, depth })).toBeLessThanOrEqual(limit);
      }
    }
  });

  it('satisfies the slice balance dσ/dz = ρ_b g − (μ_w K/R_h) σ', () => {
    // Equilibrium of a horizontal slice of the fill against wall friction, the equation Janssen
    // solved (Janssen 1895 [from memory]); central difference with step 1e-5 m: error ≈ 1e-10 relative,
    // tolerance 1e-6 for round-off in the difference.
    for (const bin of BINS) {
      for (const depth of [0.05, 0.4, 1.2]) {
        const h = 1e-5;
        const slope =
          (janssenVerticalPressure({ ...bin, depth: depth + h }) -
            janssenVerticalPressure({ ...bin, depth: depth - h })) /
          (2 * h);
        const sigma = janssenVerticalPressure({ ...bin, depth });
        expectRelative(slope, bin.bulkDensity * (bin.g ?? G) - sigma / decayLength(bin), 1e-6);
      }
    }
  });

  it('rejects bad input naming the field', () => {
    const bin = BINS[0];
    expectFieldError(() => janssenVerticalPressure({ ...bin, depth: -0.1 }), 'depth');
    expectFieldError(
      () => janssenVerticalPressure({ ...bin, depth: 1, bulkDensity: 0 }),
      'bulkDensity',
    );
    expectFieldError(
      () => janssenVerticalPressure({ ...bin, depth: 1, hydraulicRadius: -1 }),
      'hydraulicRadius',
    );
    expectFieldError(
      () => janssenVerticalPressure({ ...bin, depth: 1, wallFriction: 0 }),
      'wallFriction',
    );
    expectFieldError(
      () => janssenVerticalPressure({ ...bin, depth: 1, lateralRatio: Number.NaN }),
      'lateralRatio',
    );
    expectFieldError(() => janssenVerticalPressure({ ...bin, depth: 1, g: 0 }), 'g');
  });
});

describe('janssenMaxFillDepth', () => {
  it('round-trips with janssenVerticalPressure', () => {
    // Closed-form inverse of the same law. Its condition number is (eˣ − 1)/x at x = z/L, below
    // 400 for x ≤ 8, so round-off stays far inside 1e-10 relative.
    for (const bin of BINS) {
      for (const x of [0.01, 0.3, 1, 3, 8]) {
        const depth = x * decayLength(bin);
        const pressureLimit = janssenVerticalPressure({ ...bin, depth });
        expectRelative(janssenMaxFillDepth({ ...bin, pressureLimit }) as number, depth, 1e-10);
      }
    }
  });

  it('returns null ("any depth") when the deep-bin limit does not exceed the pressure limit', () => {
    for (const bin of BINS) {
      const asymptote = janssenAsymptoticPressure(bin);
      expect(janssenMaxFillDepth({ ...bin, pressureLimit: asymptote })).toBeNull();
      expect(janssenMaxFillDepth({ ...bin, pressureLimit: 2 * asymptote })).toBeNull();
      expect(
        Number.isFinite(janssenMaxFillDepth({ ...bin, pressureLimit: 0.999999 * asymptote })),
      ).toBe(true);
    }
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(() => janssenMaxFillDepth({ ...BINS[0], pressureLimit: 0 }), 'pressureLimit');
    expectFieldError(
      () => janssenMaxFillDepth({ ...BINS[0], pressureLimit: 1e3, wallFriction: -0.3 }),
      'wallFriction',
    );
  });
});

describe('rectangularBinHydraulicRadius', () => {
  it('is area / perimeter: side/4 for a square, → width/2 for a long trough', () => {
    // Hydraulic radius R_h = area / perimeter of the bin's cross-section (Janssen 1895). Round-off only: 1e-12; the long
    // trough at L/W = 1e9 differs from W/2 by 1e-9 relative.
    expectRelative(rectangularBinHydraulicRadius(1.2, 1.2), 0.3, 1e-12);
    expectRelative(rectangularBinHydraulicRadius(1.2, 1.0), (1.2 * 1.0) / 4.4, 1e-12);
    expectRelative(rectangularBinHydraulicRadius(1e9, 0.4), 0.2, 1e-8);
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(() => rectangularBinHydraulicRadius(0, 1), 'length');
    expectFieldError(() => rectangularBinHydraulicRadius(1, -1), 'width');
  });
});
