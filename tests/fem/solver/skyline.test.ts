import { describe, expect, it } from 'vitest';
import { assembleStiffness } from '../../../fem/body/assembly';
import { symmetryConstraints } from '../../../fem/body/symmetry';
import { addEdgePressure } from '../support/edge-load';
import { MESH_LEVEL_PARAMS } from '../../../fem/mesh/mesh-levels';
import { quarterEllipseMesh } from '../../../fem/mesh/quarter-ellipse';
import { csrGet, csrMultiply } from '../support/csr';
import { solveSymmetric } from '../support/symmetric-solve';
import { mathjsSolve } from '../support/mathjs-reference';

const maxAbs = (v: ArrayLike<number>): number =>
  Array.from(v).reduce((m, x) => Math.max(m, Math.abs(x)), 0);

/** Coarse quarter-section problem with a pressure patch at the pole; inputs are invented. */
function problem(model: 'axisymmetric' | 'plane-strain') {
  const mesh = quarterEllipseMesh(1.3, MESH_LEVEL_PARAMS.sparse);
  const k = assembleStiffness(mesh, model, 1, 0.35);
  const fixed = symmetryConstraints(mesh);
  const f = new Float64Array(k.n);
  for (let i = 0; i < 6; i++) {
    addEdgePressure(
      f,
      mesh.nodeR,
      mesh.nodeZ,
      mesh.surface[i],
      mesh.surface[i + 1],
      1,
      model === 'axisymmetric',
    );
  }
  return { mesh, k, fixed, f };
}

describe('assembled stiffness and skyline solver', () => {
  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`assembles a symmetric K (${model})`, () => {
      // Source: Cook et al. 2002 [from memory]: K = Σ kₑ of symmetric element matrices is symmetric.
      const { k } = problem(model);
      let worst = 0;
      for (let i = 0; i < k.n; i++) {
        for (let p = k.rowPtr[i]; p < k.rowPtr[i + 1]; p++) {
          worst = Math.max(worst, Math.abs(k.values[p] - csrGet(k, k.colIdx[p], i)));
        }
      }
      // Tolerance 1e-14 of the largest entry: the same products summed in a different order.
      expect(worst).toBeLessThanOrEqual(1e-14 * maxAbs(k.values));
    });

    it(`agrees with mathjs sparse LU (${model})`, () => {
      // Reference: mathjs slu + lusolve, an independent LU code. Tolerance 1e-9
      // relative to the largest displacement: both are direct solves of a matrix with a
      // condition number near 1e4–1e5, so they agree to ~1e-11; 1e-9 leaves margin.
      const { k, fixed, f } = problem(model);
      const u = solveSymmetric(k, f, fixed);
      const ref = mathjsSolve(k, f, fixed);
      const diff = u.map((x, i) => x - ref[i]);
      expect(maxAbs(diff)).toBeLessThan(1e-9 * maxAbs(ref));
      // The residual on the free DOFs vanishes too (same tolerance against the load scale).
      const res = csrMultiply(k, u).map((x, i) => (fixed[i] ? 0 : x - f[i]));
      expect(maxAbs(res)).toBeLessThan(1e-9 * maxAbs(f));
    });
  }
});
