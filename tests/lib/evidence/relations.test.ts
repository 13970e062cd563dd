import { describe, expect, it } from 'vitest';
import {
  DENSITY_FROM_MASS,
  MASS_FROM_SIZE,
  densityFromMass,
  energyFromHeight,
  heightFromEnergy,
  massFromSize,
  massScaled,
  axialByShape,
  propagateRelativeSd,
  lateralRatioFromRepose,
  lateralRatioRelation,
} from '@/lib/evidence/relations';

/**
 * Standard normal samples from a seeded linear congruential generator (the ANSI C constants) and
 * the Box–Muller transform, written here so the Monte Carlo checks share nothing with the code.
 */
function normalGenerator(start: number) {
  let seed = start;
  const uniform = () => {
    seed = (seed * 1103515245 + 12345) % 2 ** 31;
    return (seed + 1) / (2 ** 31 + 1);
  };
  return () => Math.sqrt(-2 * Math.log(uniform())) * Math.cos(2 * Math.PI * uniform());
}

describe('derived relations, each against a worked example', () => {
  it('mass from size: a 70 mm sphere of water weighs 179.59 g', () => {
    // Worked by hand: V = 4/3·π·(0.035 m)³ = 1.79594e-4 m³; × 1000 kg/m³ = 0.179594 kg.
    // Tolerance 1e-6 relative: the only error is floating point.
    expect(massFromSize(1000, 70, 70)).toBeCloseTo(179.594, 2);
    expect(Math.abs(massFromSize(1000, 70, 70) / 179.594 - 1)).toBeLessThan(1e-5);
  });

  it('density from mass: cherry tomato Forme within 6 % of its measured density', () => {
    // Polat, Turkoglu, Atay & Pakyurek 2007, Philipp. Agric. Sci. 90(1):75–80 (abstract): mass
    // 8.69 g, diameters 24.95 and 21.23 mm, measured (water displacement) density 1194 kg/m³.
    // The spheroid of those diameters holds 6920 mm³, giving 1256 kg/m³: 5.2 % above the
    // measurement. Tolerance 6 %: a real fruit is not a perfect spheroid, which is why a measured
    // density outranks a derived one on the ladder.
    const derived = densityFromMass(8.69, 24.95, 21.23);
    expect(derived).toBeGreaterThan(1194);
    expect(Math.abs(derived / 1194 - 1)).toBeLessThan(0.06);
  });

  it('drop height from energy: 129.6 mJ is a 200 mm drop of a 66.06 g mass', () => {
    // Pathare, Al-Dairi & Al Mahdouri 2023, Arab Gulf J. Sci. Res. (abstract): drops of 20, 40
    // and 60 cm are 129.6, 259.2 and 388.8 mJ, i.e. m·g·h with m·g = 0.648 N (m = 66.06 g at
    // g = 9.81 m/s²). Tolerance 0.1 %: their g of 9.81 against our 9.80665 differs by 0.034 %.
    const m = 129.6e-3 / (9.81 * 0.2) / 1e-3;
    for (const [mj, mm] of [
      [129.6, 200],
      [259.2, 400],
      [388.8, 600],
    ]) {
      expect(Math.abs(heightFromEnergy(mj / 1000, m) / mm - 1)).toBeLessThan(1e-3);
      expect(Math.abs(energyFromHeight(mm, m) / (mj / 1000) - 1)).toBeLessThan(1e-3);
    }
  });

  it('a mass scales with the cube of the size and the axial diameter with the shape', () => {
    // Same shape and density: twice the diameter, eight times the volume (exact).
    expect(massScaled(100, 50, 100)).toBeCloseTo(800, 10);
    // A 70 × 63 mm fruit (aspect 0.9) typed as 80 mm keeps its aspect: 72 mm (exact).
    expect(axialByShape(63, 70, 80)).toBeCloseTo(72, 10);
  });

  it('spreads carry through a product of powers as a Monte Carlo of the same relation does', () => {
    // First order (Taylor 1997, eq. 3.47): relative SD² = 1²·0.05² + 2²·0.03² + 1²·0.03²
    // = 0.0070, so 8.37 %. A Monte Carlo of the relation itself (200 000 normal samples from a
    // seeded generator written here) agrees within 3 % of that figure: the residual is the
    // second-order term of D², small at these spreads.
    const first = propagateRelativeSd(MASS_FROM_SIZE, {
      density: 0.05,
      equatorial: 0.03,
      axial: 0.03,
    });
    expect(first).toBeCloseTo(Math.sqrt(0.007), 10);
    const normal = normalGenerator(12345);
    const xs: number[] = [];
    for (let i = 0; i < 200_000; i++)
      xs.push(
        massFromSize(
          1000 * (1 + 0.05 * normal()),
          70 * (1 + 0.03 * normal()),
          70 * (1 + 0.03 * normal()),
        ),
      );
    const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((a, x) => a + (x - mean) ** 2, 0) / (xs.length - 1));
    expect(Math.abs(sd / mean / first! - 1)).toBeLessThan(0.03);
  });

  it('an input with no spread counts as exact; none at all gives no spread', () => {
    expect(
      propagateRelativeSd(DENSITY_FROM_MASS, { mass: 0.1, equatorial: null, axial: null }),
    ).toBeCloseTo(0.1, 12);
    expect(
      propagateRelativeSd(DENSITY_FROM_MASS, { mass: null, equatorial: null, axial: null }),
    ).toBeNull();
  });

  it("lateral pressure ratio from the angle of repose: Jáky's K₀ = 1 − sin φ", () => {
    // Worked values of K₀ = 1 − sin φ′ in soil mechanics texts (e.g. Das B.M., Principles of
    // Geotechnical Engineering, the at-rest coefficient of a sand; from memory): φ′ = 30° gives
    // 0.50 and φ′ = 35° gives 0.426. Tolerance 0.001 absolute: the texts print three decimals.
    expect(Math.abs(lateralRatioFromRepose(30) - 0.5)).toBeLessThan(1e-3);
    expect(Math.abs(lateralRatioFromRepose(35) - 0.426)).toBeLessThan(1e-3);
    // The spread: the local elasticity against a Monte Carlo of the relation at φ = 30° ± 2°
    // (6.7 % relative), 200 000 samples from a seeded generator written here. Within 3 %: the
    // residual is second order in the spread.
    const rel = lateralRatioRelation(30);
    const first = propagateRelativeSd(rel, { repose: 2 / 30 });
    const normal = normalGenerator(777);
    const ks: number[] = [];
    for (let i = 0; i < 200_000; i++) ks.push(lateralRatioFromRepose(30 + 2 * normal()));
    const mean = ks.reduce((a, b) => a + b, 0) / ks.length;
    const sd = Math.sqrt(ks.reduce((a, x) => a + (x - mean) ** 2, 0) / (ks.length - 1));
    expect(Math.abs(sd / mean / first! - 1)).toBeLessThan(0.03);
  });
});
