// Dev-only bridge to mathjs, the independent reference solver of the tests and the solver benchmark.
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

/** mathjs SparseMatrix (CSC) of the rows and columns `dofs` of symmetric K. */
export function mathjsSubmatrix(k: CsrMatrix, dofs: number[]): math.Matrix {
  const map = new Int32Array(k.n).fill(-1);
  dofs.forEach((d, i) => (map[d] = i));
  const values: number[] = [];
  const index: number[] = [];
  const ptr = [0];
  // K is symmetric, so its rows are its columns: CSR rows serve as CSC columns.
  for (const col of dofs) {
    for (let p = k.rowPtr[col]; p < k.rowPtr[col + 1]; p++) {
      const row = map[k.colIdx[p]];
      if (row >= 0) {
        index.push(row);
        values.push(k.values[p]);
      }
    }
    ptr.push(index.length);
  }
  return new SparseMatrix({ values, index, ptr, size: [dofs.length, dofs.length] });
}
