// CSR helpers for the tests and the solver benchmark; the core only needs the CsrMatrix type.
import type { CsrMatrix } from '../../../fem/solver/csr';

/** CSR copy of a dense square matrix given as rows, keeping entries that are not exactly zero. */
export function csrFromDense(rows: ArrayLike<ArrayLike<number>>): CsrMatrix {
  const n = rows.length;
  const rowPtr = new Int32Array(n + 1);
  const cols: number[] = [];
  const vals: number[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (rows[i][j] !== 0) {
        cols.push(j);
        vals.push(rows[i][j]);
      }
    }
    rowPtr[i + 1] = cols.length;
  }
  return { n, rowPtr, colIdx: Int32Array.from(cols), values: Float64Array.from(vals) };
}

/** y = A x. */
export function csrMultiply(a: CsrMatrix, x: ArrayLike<number>): Float64Array {
  const y = new Float64Array(a.n);
  for (let i = 0; i < a.n; i++) {
    let s = 0;
    for (let p = a.rowPtr[i]; p < a.rowPtr[i + 1]; p++) s += a.values[p] * x[a.colIdx[p]];
    y[i] = s;
  }
  return y;
}

/** Entry A[i][j] (0 if outside the pattern); binary search in row i. */
export function csrGet(a: CsrMatrix, i: number, j: number): number {
  let lo = a.rowPtr[i];
  let hi = a.rowPtr[i + 1] - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = a.colIdx[mid];
    if (c === j) return a.values[mid];
    if (c < j) lo = mid + 1;
    else hi = mid - 1;
  }
  return 0;
}
