// Independent reference solver for the tests: mathjs's sparse LU (slu + lusolve), not our skyline.
import * as math from 'mathjs';
import type { CsrMatrix } from '../../../fem/solver/csr';
import { mathjsSubmatrix } from './mathjs-sparse';

/** mathjs SparseMatrix of K without the `fixed` rows and columns, plus the kept DOF indices. */
export function reducedSparse(k: CsrMatrix, fixed: Uint8Array): { a: math.Matrix; free: number[] } {
  const free: number[] = [];
  for (let i = 0; i < k.n; i++) if (!fixed[i]) free.push(i);
  return { a: mathjsSubmatrix(k, free), free };
}

/** Solves K u = f with u = 0 on `fixed` DOFs using mathjs (AMD ordering on A + Aᵀ, partial pivoting). */
export function mathjsSolve(k: CsrMatrix, f: ArrayLike<number>, fixed: Uint8Array): Float64Array {
  const { a, free } = reducedSparse(k, fixed);
  const lu = math.slu(a, 1, 1);
  const x = math
    .lusolve(
      lu,
      free.map((i) => f[i]),
    )
    .toArray() as number[][];
  const u = new Float64Array(k.n);
  free.forEach((dof, i) => (u[dof] = x[i][0]));
  return u;
}
