import { describe, expect, it } from 'vitest';
import { runSqueeze, type MeshLevel } from '../../../fem';

// Inputs invented: a 40 mm radius sphere, E = 3 MPa, between rigid plates, 0.02 mm travel per
// pad (a ≈ 0.9 mm = 0.022 R, close to the half-space of Hertz).
const R = 0.04;
const E = 3e6;
const TRAVEL = 0.00002;
const force = (poisson: number, mesh: MeshLevel) =>
  runSqueeze({ equatorialRadius: R, modulus: E, poisson, travel: TRAVEL, steps: 1, mesh }).final
    .force;
// Hertz, rigid flat on a sphere: F = (4/3) E* R^½ δ^{3/2}, E* = E/(1 − ν²) (Johnson, Contact
// Mechanics, 1985, ch. 4), with the approach δ per side equal to the pad travel.
const hertz = (poisson: number) =>
  (4 / 3) * (E / (1 - poisson * poisson)) * Math.sqrt(R) * TRAVEL ** 1.5;

describe('near-incompressible flesh (mean-dilatation elements)', () => {
  it.each([0.49, 0.499, 0])(
    'ν = %s: force against Hertz and a refined mesh',
    (nu) => {
      const normal = force(nu, 'balanced');
      const fine = force(nu, 'dense');
      console.log(
        `ν = ${nu}: FE/Hertz normal ${(normal / hertz(nu)).toFixed(4)}, fine ${(fine / hertz(nu)).toFixed(4)}`,
      );
      // Observed FE/Hertz 1.010 for ν = 0.49 and 0.499, 0.996 for ν = 0 (the fully integrated
      // quad locked: 1.19 at ν = 0.499 and 1.99 at 0.4999 at 0.2 mm, balanced mesh): the finite
      // sphere departs from the half-space by about 1 % at this a/R. Tolerance 2 %, about twice
      // the observed.
      expect(Math.abs(normal / hertz(nu) - 1)).toBeLessThan(0.02);
      // Refined reference (the dense mesh, twice the resolution): observed 0.1 %; tolerance 0.5 %.
      expect(Math.abs(normal / fine - 1)).toBeLessThan(0.005);
    },
    30_000,
  );
});
