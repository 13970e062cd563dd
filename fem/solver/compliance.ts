import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { FemInputError } from '../errors';

/** A condensed contact system held as its compliance (flexibility) C = K⁻¹. */
export interface ContactSystem {
  size: number;
  /** C = K⁻¹ (m/N for a real body), symmetric positive definite */
  compliance: Matrix;
  /** the same, row-major, for fast products */
  flat: Float64Array;
}

/** Builds the contact system from a condensed stiffness K (SPD); throws FemInputError otherwise. */
export function createContactSystem(stiffness: Matrix): ContactSystem {
  const n = stiffness.rows;
  if (!stiffness.isSquare()) throw new FemInputError('stiffness', 'stiffness must be square');
  const scale = Math.max(stiffness.max(), -stiffness.min());
  const sym = new Matrix(n, n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const a = stiffness.get(i, j);
      const b = stiffness.get(j, i);
      if (!(Math.abs(a - b) <= 1e-8 * scale)) {
        throw new FemInputError('stiffness', 'stiffness must be symmetric');
      }
      sym.set(i, j, (a + b) / 2);
    }
  }
  const chol = new CholeskyDecomposition(sym);
  if (!chol.isPositiveDefinite()) {
    throw new FemInputError('stiffness', 'stiffness must be positive definite');
  }
  const inv = chol.solve(Matrix.eye(n));
  const compliance = new Matrix(n, n);
  const flat = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const c = (inv.get(i, j) + inv.get(j, i)) / 2;
      compliance.set(i, j, c);
      flat[i * n + j] = c;
    }
  }
  return { size: n, compliance, flat };
}

/** A contact system from a compliance C (m/N), dense row-major n × n, symmetric positive definite. */
export function contactSystemFromCompliance(flat: Float64Array, n: number): ContactSystem {
  if (flat.length !== n * n) throw new FemInputError('compliance', 'compliance must be n × n');
  const compliance = new Matrix(n, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) compliance.set(i, j, flat[i * n + j]);
  return { size: n, compliance, flat };
}
