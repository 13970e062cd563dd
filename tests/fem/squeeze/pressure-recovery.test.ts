import { describe, expect, it } from 'vitest';
import { runSqueeze, type SqueezeInput } from '../../../fem';
import { getCondensedBody } from '../../../fem/body/cache';
import { recoverPressure, surfaceWeights } from '../../../fem/squeeze/pressure-recovery';
import { addEdgePressure } from '../support/edge-load';

const KEY = { aspect: 1.2, poisson: 0.35, level: 'sparse' } as const;

/** −f_z of each contact node under a unit pressure on the surface segments between contact nodes. */
function consistentLoads(model: 'axisymmetric' | 'plane-strain'): {
  r: Float64Array;
  fz: Float64Array;
} {
  const b = getCondensedBody({ ...KEY, model });
  const f = new Float64Array(b.dofs);
  const n = b.contactNodes.length;
  for (let i = 0; i + 1 < n; i++) {
    const [a, c] = [b.contactNodes[i], b.contactNodes[i + 1]];
    addEdgePressure(f, b.nodeR, b.nodeZ, a, c, 1, model === 'axisymmetric');
  }
  return { r: b.contactR, fz: Float64Array.from(b.contactNodes, (v) => -f[2 * v + 1]) };
}

describe('surface weights and pressure recovery', () => {
  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`the nodal areas are the consistent loads of a uniform pressure (${model})`, () => {
      // For a straight edge n_z ds = dr, so the consistent load of pressure p has
      // f_z,i = −p ∫ N_i dA projected on the pad plane (Cook, Malkus, Plesha & Witt, Concepts and
      // Applications of FEA, 2002, consistent loads [from memory]); the reference integrates along
      // the real surface edges by 2-point Gauss, which is exact for N_i·r. The last contact node
      // carries only its inner segment. Tolerance 1e-12 relative: round-off only.
      const { r, fz } = consistentLoads(model);
      const { area } = surfaceWeights(r, model);
      fz.forEach((f, i) => expect(Math.abs(area[i] - f)).toBeLessThan(1e-12 * f + 1e-15));
    });

    it(`recovers a uniform pressure from its consistent nodal forces (${model})`, () => {
      // The consistent loads of p = 250 kPa, all nodes in contact, must give back 250 kPa at every
      // node, the axis node included (its extrapolation of a constant is that constant).
      // Tolerance 1e-9 relative: a tridiagonal solve on a well-conditioned mass matrix.
      const { r, fz } = consistentLoads(model);
      const p = recoverPressure(
        r,
        fz.map((f) => 250e3 * f),
        new Uint8Array(r.length).fill(1),
        model,
      );
      p.forEach((x) => expect(Math.abs(x / 250e3 - 1)).toBeLessThan(1e-9));
    });
  }
});

describe('the recovered pressure carries the pad force', () => {
  // ∫p dA of the piecewise-linear profile, integrated here segment by segment (exact for a
  // linear p: 2π∫p r dr = 2πh[p_a(2a + b) + p_b(a + 2b)]/6 on a ring, h(p_a + p_b)/2 on a
  // strip, twice that for the plane-strain half slice), against the pad force. The recovery used
  // to leave the outer node's share out of its equations, 6–17 % too much with small pads.
  // Tolerance 0.5 % (the issue's); observed below 1e-12 (the algebra is exact unless negative
  // values are cut off).
  const cases: [string, Partial<SqueezeInput>][] = [
    ['3 mm pad', { padDiameter: 0.003, edgeRadius: 0.0002 }],
    ['4 mm pad', { padDiameter: 0.004, edgeRadius: 0.0002 }],
    ['8 mm pad', { padDiameter: 0.008, edgeRadius: 0.0002 }],
    ['13 mm pad', { padDiameter: 0.013 }],
    ['plate', {}],
    ['plane-strain 8 mm pad', { model: 'plane-strain', padDiameter: 0.008 }],
  ];
  it.each(cases)('%s', (_name, patch) => {
    const res = runSqueeze({
      equatorialRadius: 0.04,
      modulus: 3e6,
      poisson: 0.35,
      travel: 0.001,
      steps: 4,
      ...patch,
    });
    const ring = res.input.model === 'axisymmetric';
    let total = 0;
    for (let i = 0; i + 1 < res.profile.length; i++) {
      const [a, b] = [res.profile[i], res.profile[i + 1]];
      const h = b.r - a.r;
      total += ring
        ? (2 * Math.PI * h * (a.pressure * (2 * a.r + b.r) + b.pressure * (a.r + 2 * b.r))) / 6
        : h * (a.pressure + b.pressure);
    }
    expect(Math.abs(total / res.final.force - 1)).toBeLessThan(0.005);
  });
});
