// Independent reference solver for the tests: mathjs's sparse LU (slu + lusolve), not our skyline.
import * as math from 'mathjs';
import type { CsrMatrix } from '../../../fem/solver/csr';

interface SparseData {
  values: number[];
  index: number[];
  ptr: number[];
  size: [number, number];
}
type SparseCtor = new (data: SparseData) => math.Matrix;
const SparseMatrix = (math as unknown as { SparseMatrix: SparseCtor }).SparseMatrix;

/** mathjs SparseMatrix of K without the `fixed` rows and columns, plus the kept DOF indices. */
export function reducedSparse(k: CsrMatrix, fixed: Uint8Array): { a: math.Matrix; free: number[] } {
  const free: number[] = [];
  const map = new Int32Array(k.n).fill(-1);
  for (let i = 0; i < k.n; i++) if (!fixed[i]) map[i] = free.push(i) - 1;
  const values: number[] = [];
  const index: number[] = [];
  const ptr = [0];
  // K is symmetric, so its rows are its columns: CSR rows serve as CSC columns.
  for (const col of free) {
    for (let p = k.rowPtr[col]; p < k.rowPtr[col + 1]; p++) {
      const row = map[k.colIdx[p]];
      if (row >= 0) {
        index.push(row);
        values.push(k.values[p]);
      }
    }
    ptr.push(index.length);
  }
  return { a: new SparseMatrix({ values, index, ptr, size: [free.length, free.length] }), free };
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
