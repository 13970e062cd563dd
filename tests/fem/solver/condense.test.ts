import { describe, expect, it } from 'vitest';
import { assembleStiffness } from '../../../fem/body/assembly';
import { symmetryConstraints } from '../../../fem/body/symmetry';
import { condense } from '../../../fem/solver/condense';
import { MESH_LEVEL_PARAMS } from '../../../fem/mesh/mesh-levels';
import { quarterEllipseMesh } from '../../../fem/mesh/quarter-ellipse';
import { csrFromDense, csrMultiply } from '../support/csr';
import { solveSymmetric } from '../support/symmetric-solve';

const maxAbs = (v: ArrayLike<number>): number =>
  Array.from(v).reduce((m, x) => Math.max(m, Math.abs(x)), 0);

describe('static condensation', () => {
  it('condenses three springs in series to their series stiffness', () => {
    // R. J. Guyan, Reduction of stiffness and mass matrices, AIAA Journal 3(2):380, 1965 [from
    // memory]. Worked example, computed from K* = K_cc − K_cf K_ff⁻¹ K_fc: springs 100, 200,
    // 300 N/mm over nodes 0–3, keep 0 and 3 → K* = 54.5·[1 −1; −1 1] N/mm, and u = (0, 1) at
    // the kept nodes moves the inner nodes 0.545 and 0.818.
    // Exact: series stiffness 1/(1/100 + 1/200 + 1/300) = 600/11 = 54.545…; inner nodes 6/11, 9/11.
    const k = csrFromDense([
      [100, -100, 0, 0],
      [-100, 300, -200, 0],
      [0, -200, 500, -300],
      [0, 0, -300, 300],
    ]);
    const sys = condense(k, [0, 3], new Uint8Array(4));
    const kser = 600 / 11;
    // Tolerance 1e-12 relative: a 2×2 elimination, round-off only.
    expect(sys.kstar[0]).toBeCloseTo(kser, 10);
    expect(sys.kstar[1]).toBeCloseTo(-kser, 10);
    expect(sys.kstar[2]).toBeCloseTo(-kser, 10);
    expect(sys.kstar[3]).toBeCloseTo(kser, 10);
    // The worked example's rounding: 54.5 to three figures (tolerance 0.05 N/mm, half the last digit).
    expect(Math.abs(sys.kstar[0] - 54.5)).toBeLessThan(0.05);
    const u = sys.recover([0, 1]);
    expect(u[1]).toBeCloseTo(6 / 11, 12);
    expect(u[2]).toBeCloseTo(9 / 11, 12);
    // Printed 0.545 and 0.818 (tolerance half the last printed digit).
    expect(Math.abs(u[1] - 0.545)).toBeLessThan(5e-4);
    expect(Math.abs(u[2] - 0.818)).toBeLessThan(5e-4);
  });

  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`matches a full solve with prescribed contact displacements (${model})`, () => {
      // Source: Cook et al. 2002, static condensation is exact for statics [from memory]. Reference:
      // the full system with u_c prescribed (moved to the right-hand side), solved by the full
      // skyline factorisation, itself checked against mathjs's sparse LU in solver.test.ts.
      const mesh = quarterEllipseMesh(0.7, MESH_LEVEL_PARAMS.sparse);
      const k = assembleStiffness(mesh, model, 1, 0.3);
      const fixed = symmetryConstraints(mesh);
      const contact = Array.from(mesh.surface).filter((v) => mesh.nodeR[v] <= 0.6);
      const keep = contact.map((v) => 2 * v + 1);
      const sys = condense(k, keep, fixed, [keep[0]]);
      // An invented squeeze-like pattern: deeper at the pole, a bump further out.
      const uc = contact.map((v, i) => -1e-3 * (1 - mesh.nodeR[v] ** 2) + 2e-4 * Math.sin(i));

      const up = new Float64Array(k.n);
      keep.forEach((dof, i) => (up[dof] = uc[i]));
      const rhs = csrMultiply(k, up).map((x) => -x);
      const fixedAll = fixed.slice();
      for (const dof of keep) fixedAll[dof] = 1;
      const full = solveSymmetric(k, rhs, fixedAll).map((x, i) => x + up[i]);
      const forces = csrMultiply(k, full);

      const recovered = sys.recover(uc);
      // Tolerance 1e-9 relative to the largest displacement / force: both are direct solves.
      expect(maxAbs(recovered.map((x, i) => x - full[i]))).toBeLessThan(1e-9 * maxAbs(full));
      const nc = keep.length;
      const fc = keep.map((_, i) => uc.reduce((s, u, j) => s + sys.kstar[i * nc + j] * u, 0));
      const fRef = keep.map((dof) => forces[dof]);
      expect(maxAbs(fc.map((x, i) => x - fRef[i]))).toBeLessThan(1e-9 * maxAbs(fRef));
    });
  }

  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`scales as the CondensedBody contract says (${model})`, () => {
      // Dimensional analysis: K ∝ ∫BᵀDB dV with B ∝ 1/R, D ∝ E, dV ∝ R³ (ring,
      // 2π r dA) or R² (per metre of thickness), so K_real = E·R·K_unit or E·K_unit.
      // Tolerance 1e-10 relative: the same arithmetic on scaled numbers.
      const unit = quarterEllipseMesh(0.9, MESH_LEVEL_PARAMS.sparse);
      const radius = 0.04;
      const modulus = 3e6;
      const real = {
        ...unit,
        nodeR: unit.nodeR.map((r) => r * radius),
        nodeZ: unit.nodeZ.map((z) => z * radius),
      };
      const fixed = symmetryConstraints(unit);
      const keep = Array.from(unit.surface.subarray(0, 12), (v) => 2 * v + 1);
      const kUnit = condense(assembleStiffness(unit, model, 1, 0.4), keep, fixed).kstar;
      const kReal = condense(assembleStiffness(real, model, modulus, 0.4), keep, fixed).kstar;
      const factor = model === 'axisymmetric' ? modulus * radius : modulus;
      const worst = maxAbs(kReal.map((x, i) => x - factor * kUnit[i]));
      expect(worst).toBeLessThan(1e-10 * maxAbs(kReal));
    });
  }
});
