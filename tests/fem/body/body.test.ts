import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { afterEach, describe, expect, it } from 'vitest';
import { assembleStiffness } from '../../../fem/body/assembly';
import { clearCondensedBodyCache, getCondensedBody } from '../../../fem/body/cache';
import { FemInputError } from '../../../fem/errors';
import { MESH_LEVEL_PARAMS } from '../../../fem/mesh/mesh-levels';
import { quarterEllipseMesh } from '../../../fem/mesh/quarter-ellipse';
import type { BodyModel, UnitBodyKey } from '../../../fem/types';
import { csrGet } from '../support/csr';

const KEY: UnitBodyKey = { model: 'axisymmetric', aspect: 1.2, poisson: 0.35, level: 'sparse' };

/** Dense Guyan condensation of the KEY body (sparse mesh) with ml-matrix. */
function denseCondensation(model: BodyModel) {
  const mesh = quarterEllipseMesh(KEY.aspect, MESH_LEVEL_PARAMS[KEY.level]);
  const k = assembleStiffness(mesh, model, 1, KEY.poisson);
  const contactNodes = Array.from(mesh.surface).filter((v) => mesh.nodeR[v] <= 0.6);
  const c = contactNodes.map((v) => 2 * v + 1);
  const held = (dof: number) => (dof % 2 === 0 ? mesh.nodeR : mesh.nodeZ)[dof >> 1] === 0;
  const f = Array.from({ length: k.n }, (_, i) => i).filter((i) => !held(i) && !c.includes(i));
  const block = (rows: number[], cols: number[]) =>
    new Matrix(rows.map((i) => cols.map((j) => csrGet(k, i, j))));
  const kfc = block(f, c);
  const x = new CholeskyDecomposition(block(f, f)).solve(kfc); // K_ff⁻¹ K_fc
  const kstar = block(c, c).sub(kfc.transpose().mmul(x));
  const recover = (uc: Float64Array): Float64Array => {
    const uf = x.mmul(Matrix.columnVector(Array.from(uc))).to1DArray();
    const u = new Float64Array(k.n);
    f.forEach((dof, i) => (u[dof] = -uf[i]));
    c.forEach((dof, i) => (u[dof] = uc[i]));
    return u;
  };
  return { contactNodes, kstar, recover };
}

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
      // Source: Cook et al. 2002 [from memory]: the Schur complement of an SPD matrix is SPD.
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

  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`K and recover() match a dense Schur complement of the assembled body (${model})`, () => {
      // Reference: Guyan, "Reduction of stiffness and mass matrices", AIAA Journal 3(2):380, 1965
      // [from memory]: K* = K_cc − K_cf K_ff⁻¹ K_fc and u_f = −K_ff⁻¹ K_fc u_c, computed here
      // densely with ml-matrix's Cholesky on the same assembled stiffness, not by the skyline
      // elimination under test. Constraints are set from the geometry (u_r = 0 where r = 0,
      // u_z = 0 where z = 0) and the kept DOFs are the u_z of the surface nodes with r ≤ 0.6.
      const b = getCondensedBody({ ...KEY, model });
      const ref = denseCondensation(model);
      expect(Array.from(b.contactNodes)).toEqual(ref.contactNodes);
      // Tolerance 1e-9 of the largest entry: two direct double-precision eliminations of a
      // matrix with condition number ~1e5 agree to ~1e-11.
      const scale = Math.max(...ref.kstar.to1DArray().map(Math.abs));
      const diff = b.K.clone().sub(ref.kstar).abs().max();
      expect(diff).toBeLessThan(1e-9 * scale);
      const uc = Float64Array.from(b.contactR, (r, i) => -1e-3 * (1 - r * r) + 2e-4 * Math.sin(i));
      const u = b.recover(uc);
      const uRef = ref.recover(uc);
      const uMax = Math.max(...uRef.map(Math.abs));
      // Same tolerance, relative to the largest displacement.
      expect(Math.max(...u.map((x, i) => Math.abs(x - uRef[i])))).toBeLessThan(1e-9 * uMax);
      expect(b.stresses(u)).toHaveLength(b.quads.length / 4);
    });
  }
});
