import { CholeskyDecomposition } from 'ml-matrix';
import { afterEach, describe, expect, it } from 'vitest';
import { clearCondensedBodyCache, getCondensedBody } from '../../../fem/body/cache';
import { addEdgePressure } from '../support/edge-load';
import { FemInputError } from '../../../fem/errors';
import type { UnitBodyKey } from '../../../fem/types';

const KEY: UnitBodyKey = { model: 'axisymmetric', aspect: 1.2, poisson: 0.35, level: 'coarse' };

function fieldOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    if (e instanceof FemInputError) return e.field;
    throw e;
  }
  return undefined;
}

describe('getCondensedBody', () => {
  afterEach(() => clearCondensedBodyCache());

  it('caches per key and rebuilds after clearing', () => {
    const a = getCondensedBody(KEY);
    expect(getCondensedBody({ ...KEY })).toBe(a);
    expect(getCondensedBody({ ...KEY, poisson: 0.3 })).not.toBe(a);
    clearCondensedBodyCache();
    expect(getCondensedBody(KEY)).not.toBe(a);
  });

  it('rejects bad keys naming the field', () => {
    expect(fieldOf(() => getCondensedBody({ ...KEY, aspect: 0.2 }))).toBe('aspect');
    expect(fieldOf(() => getCondensedBody({ ...KEY, aspect: Number.NaN }))).toBe('aspect');
    expect(fieldOf(() => getCondensedBody({ ...KEY, poisson: 0.5 }))).toBe('poisson');
    expect(fieldOf(() => getCondensedBody({ ...KEY, model: 'shell' as never }))).toBe('model');
    expect(fieldOf(() => getCondensedBody({ ...KEY, level: 'ultra' as never }))).toBe('level');
    const b = getCondensedBody(KEY);
    expect(fieldOf(() => b.recover(new Float64Array(3)))).toBe('uc');
    expect(fieldOf(() => b.recover(new Float64Array(b.contactR.length).fill(Number.NaN)))).toBe(
      'uc',
    );
    expect(fieldOf(() => b.stresses(new Float64Array(4)))).toBe('u');
  });

  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`returns a symmetric positive definite K on the contact nodes (${model})`, () => {
      // Source: Cook et al. 2002 [memory]: the Schur complement of an SPD matrix is SPD.
      const b = getCondensedBody({ ...KEY, model });
      const n = b.contactR.length;
      expect(b.K.rows).toBe(n);
      expect(b.contactZ.length).toBe(n);
      expect(b.dofs).toBe(2 * b.nodes);
      expect(b.K.isSymmetric()).toBe(true);
      expect(new CholeskyDecomposition(b.K).isPositiveDefinite()).toBe(true);
      // Contact nodes start at the pole and run outward to r = 0.6.
      expect(b.contactR[0]).toBe(0);
      expect(b.contactZ[0]).toBeCloseTo(KEY.aspect, 14);
      expect(b.contactR[n - 1]).toBeLessThanOrEqual(0.6);
      expect(b.contactR[n - 1]).toBeGreaterThan(0.55);
    });
  }

  it('recovers a displacement field that honours the contact values and the symmetry', () => {
    const b = getCondensedBody(KEY);
    const uc = Float64Array.from(b.contactR, (r) => -1e-3 * (1 - r * r));
    const u = b.recover(uc);
    expect(u.length).toBe(b.dofs);
    expect(Array.from(b.contactNodes)).toEqual(Array.from(b.surfaceNodes.subarray(0, uc.length)));
    b.contactNodes.forEach((v, i) => expect(u[2 * v + 1]).toBe(uc[i]));
    for (let v = 0; v < b.nodes; v++) {
      if (b.nodeR[v] === 0) expect(u[2 * v]).toBe(0);
      if (b.nodeZ[v] === 0) expect(u[2 * v + 1]).toBe(0);
    }
    expect(b.stresses(u)).toHaveLength(b.quads.length / 4);
  });

  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`contactArea is the consistent nodal area of a uniform pad pressure (${model})`, () => {
      // For a straight edge n_z ds = dr, so the consistent load of pressure p on the surface has
      // f_z,i = −p ∫ N_i dA_projected = −p · contactArea_i (computed here by Gauss quadrature
      // along the real surface edges). Tolerance 1e-12 relative (round-off).
      const b = getCondensedBody({ ...KEY, model });
      const f = new Float64Array(b.dofs);
      const n = b.contactNodes.length;
      // Load the segments on both sides of every contact node (one beyond the last).
      for (let i = 0; i < n; i++) {
        const [a, c] = [b.surfaceNodes[i], b.surfaceNodes[i + 1]];
        addEdgePressure(f, b.nodeR, b.nodeZ, a, c, 1, model === 'axisymmetric');
      }
      for (let i = 0; i < n; i++) {
        const fz = f[2 * b.contactNodes[i] + 1];
        expect(Math.abs(-fz - b.contactArea[i])).toBeLessThan(1e-12 * b.contactArea[i] + 1e-15);
      }
    });
  }
});
