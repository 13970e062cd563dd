import { describe, expect, it } from 'vitest';
import { runSqueeze, type SqueezeInput } from '../../../fem';

// The pad's facing as an elastic layer bonded to the rigid pad, pressed by the fruit through a
// frictionless interface. Inputs invented; R = 40 mm throughout.
const R = 0.04;
const rel = (x: number, y: number) => Math.abs(x / y - 1);

describe('pad facing layer', () => {
  it('a thin compressible layer acts as a Winkler foundation of its confined stiffness', () => {
    // A thin layer bonded to a rigid base is compressed without lateral strain: foundation
    // modulus K = E_c/t with the confined modulus E_c = E(1 − ν)/((1 + ν)(1 − 2ν)). A rigid sphere
    // pressed by δ into it: p = K(δ − r²/2R), a = √(2Rδ), F = πKRδ² (the elastic foundation
    // model, K. L. Johnson, Contact Mechanics, 1985, ch. 5 [from memory]; worked example, computed
    // from p = K·(gap closed)). The fruit here is 10⁴ times stiffer than the layer (rigid), and
    // the layer is t = 0.05 mm under a contact of a ≈ 0.9 mm (t/a ≈ 0.06).
    const [El, nu, t, d] = [0.3e6, 0.3, 5e-5, 1e-5];
    const res = runSqueeze({
      equatorialRadius: R,
      modulus: 3e9,
      poisson: 0.3,
      travel: d,
      steps: 1,
      facingModulus: El,
      facingThickness: t,
      facingPoisson: nu,
    });
    const K = (El * (1 - nu)) / ((1 + nu) * (1 - 2 * nu)) / t;
    // Observed: F −0.6 %, peak −0.4 %, a −2.2 % (the layer's edge effect over a width ~ t, and
    // the contact edge is found where the gap closes, extrapolated for a Hertz-like (r − a)^{3/2}
    // opening rather than the foundation's linear one). Tolerances about twice those.
    expect(rel(res.final.force, Math.PI * K * R * d * d)).toBeLessThan(0.015);
    expect(rel(res.final.peakPressure, K * d)).toBeLessThan(0.01);
    expect(rel(res.final.contactRadius, Math.sqrt(2 * R * d))).toBeLessThan(0.045);
    // Independent springs E_l/t (the confined modulus ignored) would give 1.35× less force.
    expect(res.final.force).toBeGreaterThan((1.2 * Math.PI * El * R * d * d) / t);
  });

  it('a thick soft layer acts as a second Hertz body', () => {
    // Layer much deeper than the contact (t = 40 mm, a ≈ 2.9 mm): two elastic half-spaces with
    // 1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂, a = (3FR/4E*)^{1/3}, p₀ = 3F/(2πa²) (Johnson 1985,
    // ch. 4), at the model's force. Observed: a +1.6 %, p₀ −0.4 % (the layer's bonded base at
    // 14 a makes it slightly stiffer than a half-space). Tolerances about twice those.
    const [E, nu, El, nul] = [3e6, 0.3, 1e6, 0.3];
    const res = runSqueeze({
      equatorialRadius: R,
      modulus: E,
      poisson: nu,
      travel: 0.0002,
      steps: 1,
      facingModulus: El,
      facingThickness: 0.04,
      facingPoisson: nul,
    });
    const Estar = 1 / ((1 - nu * nu) / E + (1 - nul * nul) / El);
    const F = res.final.force;
    const a = Math.cbrt((3 * F * R) / (4 * Estar));
    expect(rel(res.final.contactRadius, a)).toBeLessThan(0.035);
    expect(rel(res.final.peakPressure, (3 * F) / (2 * Math.PI * a * a))).toBeLessThan(0.01);
  });

  it('in between, the force falls steadily as the layer thickens, from the rigid pad', () => {
    const input: SqueezeInput = {
      equatorialRadius: R,
      modulus: 3e6,
      poisson: 0.35,
      travel: 0.0005,
      steps: 1,
    };
    const rigid = runSqueeze(input).final.force;
    const thickness = [1e-5, 1e-4, 3e-4, 1e-3, 3e-3, 1e-2, 4e-2];
    const force = thickness.map(
      (t) =>
        runSqueeze({ ...input, facingModulus: 1e6, facingThickness: t, facingPoisson: 0.45 }).final
          .force,
    );
    for (let i = 1; i < force.length; i++) expect(force[i]).toBeLessThan(force[i - 1]);
    // A 0.01 mm layer against a contact of a ≈ 4.5 mm: within 0.2 % of the rigid pad (observed
    // 0.08 %).
    expect(rel(force[0], rigid)).toBeLessThan(0.002);
  }, 30_000);

  it('warns when the facing is compressed past 20 % of its thickness', () => {
    // 0.1 MPa, 1 mm facing under 1 mm travel: compressed by about half its thickness.
    const soft = runSqueeze({
      equatorialRadius: R,
      modulus: 3e6,
      poisson: 0.35,
      travel: 0.001,
      steps: 2,
      facingModulus: 0.1e6,
      facingThickness: 0.001,
    });
    expect(soft.final.facingStrain).toBeGreaterThan(0.2);
    expect(soft.warnings.map((w) => w.code)).toEqual(['facing-poisson-assumed', 'facing-strain']);
    const stiff = runSqueeze({
      equatorialRadius: R,
      modulus: 3e6,
      poisson: 0.35,
      travel: 0.001,
      steps: 2,
      facingModulus: 2e6,
      facingThickness: 0.003,
      facingPoisson: 0.45,
    });
    expect(stiff.final.facingStrain).toBeLessThan(0.2);
    expect(stiff.warnings).toEqual([]);
  });
});
