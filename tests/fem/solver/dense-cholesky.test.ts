import { lusolve, matrix } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { solveSubmatrixSpd } from '../../../fem/solver/dense-cholesky';
import { randomStream } from '../../../fem';

/** A seeded SPD n × n matrix, row-major: BᵀB + n·I with B uniform in (−1, 1). */
function spd(n: number, seed: number): Float64Array {
  const { uniform: next } = randomStream(seed);
  const B = Float64Array.from({ length: n * n }, () => 2 * next() - 1);
  const A = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      let v = i === j ? n : 0;
      for (let k = 0; k < n; k++) v += B[k * n + i] * B[k * n + j];
      A[i * n + j] = v;
    }
  return A;
}

describe('dense Cholesky solve of a submatrix', () => {
  it.each([1, 3, 12, 40])('matches mathjs lusolve on a %s-row active set', (m) => {
    const n = 50;
    const A = spd(n, 7 + m);
    const { uniform: next } = randomStream(100 + m);
    // A run of rows/columns from row 3, as an active set picks some contact nodes.
    const idx = Array.from({ length: m }, (_, k) => (3 + k) % n);
    const diagonal = Float64Array.from({ length: n }, () => next() * 0.1);
    const b = Float64Array.from({ length: m }, () => 2 * next() - 1);
    const sub = idx.map((i) => idx.map((j) => A[i * n + j] + (i === j ? diagonal[i] : 0)));
    // Independent reference: mathjs LU with partial pivoting on the same submatrix.
    const ref = (lusolve(matrix(sub), Array.from(b)).valueOf() as number[][]).map((r) => r[0]);
    const x = solveSubmatrixSpd(A, n, idx, diagonal, b)!;
    // The matrices are diagonally weighted (condition number below ~10), so both solvers agree
    // to a few ulps of the solution; 1e-12 relative leaves room for 40-term sums.
    const scale = Math.max(...ref.map(Math.abs));
    for (let k = 0; k < m; k++) expect(Math.abs(x[k] - ref[k])).toBeLessThan(1e-12 * scale);
  });

  it('reports a matrix that is not positive definite', () => {
    // [[1, 2], [2, 1]] has eigenvalues 3 and −1 (by hand).
    const A = Float64Array.from([1, 2, 2, 1]);
    expect(solveSubmatrixSpd(A, 2, [0, 1], new Float64Array(2), Float64Array.from([1, 1]))).toBe(
      null,
    );
  });
});
