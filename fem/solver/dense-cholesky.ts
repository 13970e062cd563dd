/**
 * Solves A x = b for a small symmetric positive-definite A given as the rows and columns `idx`
 * of a dense row-major n × n matrix `flat`, plus `diagonal[idx[k]]` added on its diagonal, by
 * the Cholesky factorisation A = L Lᵀ (G. H. Golub and C. F. Van Loan, Matrix Computations, 4th
 * ed., 2013, Algorithm 4.2.1, the gaxpy form [from memory]) and two triangular solves. Works in
 * one Float64Array scratch of m² entries (m = idx.length): the contact solve calls it once per
 * active-set iteration, so it allocates no matrix objects.
 * Returns x (length m), or null when a pivot is not positive (A not positive definite).
 */
export function solveSubmatrixSpd(
  flat: Float64Array,
  n: number,
  idx: readonly number[],
  diagonal: Float64Array,
  b: Float64Array,
): Float64Array | null {
  const m = idx.length;
  const L = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    const row = idx[i] * n;
    for (let j = 0; j <= i; j++) {
      let v = flat[row + idx[j]];
      if (i === j) v += diagonal[idx[i]];
      for (let k = 0; k < j; k++) v -= L[i * m + k] * L[j * m + k];
      if (i === j) {
        if (!(v > 0)) return null;
        L[i * m + i] = Math.sqrt(v);
      } else L[i * m + j] = v / L[j * m + j];
    }
  }
  const x = Float64Array.from(b);
  for (let i = 0; i < m; i++) {
    let v = x[i];
    for (let k = 0; k < i; k++) v -= L[i * m + k] * x[k];
    x[i] = v / L[i * m + i];
  }
  for (let i = m - 1; i >= 0; i--) {
    let v = x[i];
    for (let k = i + 1; k < m; k++) v -= L[k * m + i] * x[k];
    x[i] = v / L[i * m + i];
  }
  return x;
}
