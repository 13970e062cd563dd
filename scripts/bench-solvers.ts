// Benchmarks the fem skyline LDLᵀ (RCM ordering) against mathjs's sparse LU on the balanced mesh:
// one full solve, and the static condensation onto the contact DOFs. Run: npx tsx scripts/bench-solvers.ts
import * as math from 'mathjs';
import { assembleStiffness } from '../fem/body/assembly';
import { symmetryConstraints } from '../fem/body/symmetry';
import { condense } from '../fem/solver/condense';
import { addEdgePressure } from '../tests/fem/support/edge-load';
import { MESH_LEVEL_PARAMS } from '../fem/mesh/mesh-levels';
import { quarterEllipseMesh } from '../fem/mesh/quarter-ellipse';
import { csrGet } from '../tests/fem/support/csr';
import { solveSymmetric } from '../tests/fem/support/symmetric-solve';
import { mathjsSubmatrix as toMathjs } from '../tests/fem/support/mathjs-sparse';

function time<T>(fn: () => T): [T, number] {
  const t0 = performance.now();
  const out = fn();
  return [out, performance.now() - t0];
}

const mesh = quarterEllipseMesh(1, MESH_LEVEL_PARAMS.balanced);
const k = assembleStiffness(mesh, 'axisymmetric', 1, 0.35);
const fixed = symmetryConstraints(mesh);
const f = new Float64Array(k.n);
for (let i = 0; i < 5; i++) {
  addEdgePressure(f, mesh.nodeR, mesh.nodeZ, mesh.surface[i], mesh.surface[i + 1], 1, true);
}
const contact = Array.from(mesh.surface).filter((v) => mesh.nodeR[v] <= 0.6);
const keep = contact.map((v) => 2 * v + 1);
const free = Array.from({ length: k.n }, (_, i) => i).filter((i) => !fixed[i]);
const condensed = free.filter((i) => !keep.includes(i));
console.log(
  `balanced mesh: ${mesh.nodeR.length} nodes, ${free.length} free DOFs, nnz ${k.rowPtr[k.n]}, ` +
    `${keep.length} contact DOFs`,
);

const runs = 3;
for (let run = 1; run <= runs; run++) {
  const [u, tSky] = time(() => solveSymmetric(k, f, fixed));
  const [x, tMj] = time(() => {
    const lu = math.slu(toMathjs(k, free), 1, 1);
    return math
      .lusolve(
        lu,
        free.map((i) => f[i]),
      )
      .toArray() as number[][];
  });
  let diff = 0;
  let ref = 0;
  free.forEach((dof, i) => {
    diff = Math.max(diff, Math.abs(u[dof] - x[i][0]));
    ref = Math.max(ref, Math.abs(x[i][0]));
  });
  const [sys, tCondSky] = time(() => condense(k, keep, fixed, [keep[0]]));
  // Dense K_fc columns prepared outside the timing, so mathjs is timed on factor + solves only.
  const nc = keep.length;
  const kfc = keep.map((c) => condensed.map((i) => csrGet(k, i, c)));
  const [kstar, tCondMj] = time(() => {
    // K* = K_cc − K_cf K_ff⁻¹ K_fc: factor K_ff once, solve for each column of K_fc.
    const lu = math.slu(toMathjs(k, condensed), 1, 1);
    const out = new Float64Array(nc * nc);
    for (let j = 0; j < nc; j++) {
      const xj = (math.lusolve(lu, kfc[j]).toArray() as number[][]).map((r) => r[0]);
      for (let i = 0; i < nc; i++) {
        let s = csrGet(k, keep[i], keep[j]);
        for (let q = 0; q < xj.length; q++) s -= kfc[i][q] * xj[q];
        out[i * nc + j] = s;
      }
    }
    return out;
  });
  let kd = 0;
  let kr = 0;
  kstar.forEach((v, i) => {
    kd = Math.max(kd, Math.abs(v - sys.kstar[i]));
    kr = Math.max(kr, Math.abs(v));
  });
  console.log(
    `run ${run}: full solve  skyline ${tSky.toFixed(1)} ms | mathjs slu+lusolve ${tMj.toFixed(1)} ms` +
      ` | max rel diff ${(diff / ref).toExponential(1)}`,
  );
  console.log(
    `       condensation skyline ${tCondSky.toFixed(1)} ms (profile ${sys.profile}) | mathjs ` +
      `${tCondMj.toFixed(1)} ms | max rel diff ${(kd / kr).toExponential(1)}`,
  );
}
