import { erf } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { runMonteCarlo, runSqueeze, type MonteCarloInput, type SqueezeInput } from '../../../fem';

// Inputs invented: an 80 mm apple-sized sphere, E = 3 MPa, ν = 0.35, 30 mm pads, 2 mm travel;
// density 840 kg/m³ (apple flesh 800–850 kg/m³, N. N. Mohsenin, Physical Properties of Plant and
// Animal Materials, 1986 [from memory]), μ = 0.4 and SF = 2 [common practice].
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.002,
  steps: 20,
  mesh: 'sparse',
  padDiameter: 0.03,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  bruiseThreshold: 150e3,
};
const deterministic = (input: SqueezeInput) => runSqueeze(input).liftability!.grip!;
const Phi = (x: number) => (1 + (erf(x / Math.SQRT2) as number)) / 2;

describe('Monte Carlo of the bruise margin', () => {
  it('zero spread reproduces the deterministic margin exactly', () => {
    const nominal = deterministic(base).bruiseMargin as number;
    const spreads = { modulus: { sd: 0 }, size: { low: 0.04, high: 0.04 } };
    const r = runMonteCarlo({ base, spreads, samples: 20, seed: 5 });
    expect(r.nominalMargin).toBe(nominal);
    expect(r.margin).toEqual({ p05: nominal, median: nominal, p95: nominal });
    expect(r.probability).toBe(nominal < 1 ? 1 : 0);
    expect(r.lifted).toBe(20);
    expect(r.drivers).toEqual([]);
  });

  it('spread in E alone matches the closed form of a log-normal E within the sampling error', () => {
    // Hertz at a fixed grip force: p₀ = (6FE*²/π³R²)^{1/3} ∝ E^{2/3} (Johnson, Contact Mechanics,
    // 1985, ch. 4); the required force SF·m(g + a)/2μ does not depend on E. With ln E ~ N(μ, s²)
    // (mean 3 MPa, cv 0.2: s² = ln(1 + cv²), μ = ln 3 MPa − s²/2) and p₀ anchored at the FE peak
    // p_nom of the nominal case, margin < 1 ⟺ E > E_c = E_nom (θ/p_nom)^{3/2}, θ the threshold:
    // P = 1 − Φ((ln E_c − μ)/s), exact.
    const pNom = deterministic(base).peakPressure;
    const n = 2000;
    const s2 = Math.log(1 + 0.2 ** 2);
    const s = Math.sqrt(s2);
    const mu = Math.log(3e6) - s2 / 2;
    for (const k of [1, 1.15]) {
      const threshold = k * pNom;
      const Ec = 3e6 * k ** 1.5;
      const z = (Math.log(Ec) - mu) / s;
      const expected = 1 - Phi(z);
      const r = runMonteCarlo({
        base: { ...base, bruiseThreshold: threshold },
        spreads: { modulus: { sd: 0.6e6 } },
        samples: n,
        seed: 11,
      });
      // The FE peak departs from E^{2/3} by δ at E_c (measured here; 0 at k = 1 by the anchor;
      // −1.1 % at k = 1.15 on the sparse mesh), moving E_c by (1 + δ)^{−3/2}: that shift of P is
      // allowed on top of 3 binomial standard errors √(P(1 − P)/n) (±0.033 at P = 0.46).
      const delta = deterministic({ ...base, modulus: Ec }).peakPressure / threshold - 1;
      const shift = Math.abs(Phi(z) - Phi(z - (1.5 * Math.log(1 + delta)) / s));
      const se = Math.sqrt((expected * (1 - expected)) / n);
      expect(Math.abs((r.probability as number) - expected)).toBeLessThan(3 * se + shift);
      // Sharper, with the model's own critical modulus (bisection of the deterministic peak on
      // E, to 1e-6 of it): P = 1 − Φ((ln E_c,model − μ)/s) within 3 standard errors alone.
      let [lo, hi] = [1e6, 9e6];
      while (hi - lo > 1e-6 * hi) {
        const mid = (lo + hi) / 2;
        if (deterministic({ ...base, modulus: mid }).peakPressure > threshold) hi = mid;
        else lo = mid;
      }
      const exact = 1 - Phi((Math.log(hi) - mu) / s);
      expect(Math.abs((r.probability as number) - exact)).toBeLessThan(3 * se);
      expect(r.confidence!.low).toBeLessThan(r.probability as number);
      expect(r.confidence!.high).toBeGreaterThan(r.probability as number);
      expect(r.drivers.map((d) => d.input)).toEqual(['modulus']);
      // The margin falls as E rises: ρ = −1 up to the FE's tiny non-monotonicity.
      expect(r.drivers[0].spearman).toBeLessThan(-0.999);
    }
  });

  it('the same seed gives the same answer, different seeds differ', () => {
    const input: MonteCarloInput = {
      base,
      spreads: { modulus: { sd: 0.6e6 }, friction: { low: 0.3, high: 0.5 } },
      samples: 60,
      seed: 21,
    };
    const a = runMonteCarlo(input);
    expect(runMonteCarlo(input)).toEqual(a);
    const b = runMonteCarlo({ ...input, seed: 22 });
    expect(b.margin).not.toEqual(a.margin);
  });

  it('names the strongest input first', () => {
    const r = runMonteCarlo({
      base,
      spreads: { modulus: { sd: 0.9e6 }, density: { sd: 10 }, bruiseThreshold: { sd: 5e3 } },
      samples: 200,
      seed: 3,
    });
    expect(r.drivers[0].input).toBe('modulus');
    expect(r.drivers[0].spearman).toBeLessThan(0);
    expect(r.drivers.find((d) => d.input === 'bruiseThreshold')!.spearman).toBeGreaterThan(0);
  });
});
