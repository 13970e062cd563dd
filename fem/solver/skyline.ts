import { FemInputError } from '../errors';
import type { CsrMatrix } from './csr';

/**
 * Symmetric matrix in skyline (variable-band, row profile) storage under a permutation, with an
 * in-place LDLᵀ (Crout) factorisation. Row i keeps columns first[i]..i contiguously, diagonal last.
 * Equation i of the skyline is DOF perm[i] of the source matrix; DOFs not in `perm` are dropped
 * (prescribed zero). After factor(nElim) the first nElim rows hold L (unit lower, diagonal = D);
 * the trailing rows hold L for columns < nElim and the Schur complement of the leading block
 * for columns ≥ nElim (Gauss elimination of the leading block only).
 */
export class SkylineMatrix {
  readonly n: number;
  readonly first: Int32Array;
  /** data index of the diagonal of row i is ptr[i + 1] − 1 */
  readonly ptr: Int32Array;
  readonly data: Float64Array;
  /** equations eliminated by the last factor() call */
  nElim = 0;

  constructor(a: CsrMatrix, perm: Int32Array) {
    const n = perm.length;
    const inv = new Int32Array(a.n).fill(-1);
    for (let i = 0; i < n; i++) inv[perm[i]] = i;
    const first = new Int32Array(n);
    const ptr = new Int32Array(n + 1);
    for (let i = 0; i < n; i++) {
      let f = i;
      const old = perm[i];
      for (let p = a.rowPtr[old]; p < a.rowPtr[old + 1]; p++) {
        const j = inv[a.colIdx[p]];
        if (j >= 0 && j < f) f = j;
      }
      first[i] = f;
      ptr[i + 1] = ptr[i] + (i - f + 1);
    }
    const data = new Float64Array(ptr[n]);
    for (let i = 0; i < n; i++) {
      const old = perm[i];
      const base = ptr[i] - first[i];
      for (let p = a.rowPtr[old]; p < a.rowPtr[old + 1]; p++) {
        const j = inv[a.colIdx[p]];
        if (j >= 0 && j <= i) data[base + j] = a.values[p];
      }
    }
    this.n = n;
    this.first = first;
    this.ptr = ptr;
    this.data = data;
  }

  /** Stored entries (the profile), a measure of factorisation memory. */
  get profile(): number {
    return this.ptr[this.n];
  }

  /**
   * Factorises the leading nElim equations (default all): A = L D Lᵀ. Throws FemInputError
   * ('stiffness') on a pivot that is not positive, i.e. a matrix that is not positive definite
   * (typically a body left free to move as a rigid body).
   */
  factor(nElim: number = this.n): void {
    const { n, first, ptr, data: a } = this;
    for (let i = 0; i < n; i++) {
      const fi = first[i];
      const pi = ptr[i] - fi;
      for (let j = fi; j < i; j++) {
        const fj = first[j];
        const pj = ptr[j] - fj;
        const k1 = j < nElim ? j : nElim;
        let s = a[pi + j];
        for (let k = fi > fj ? fi : fj; k < k1; k++) s -= a[pj + k] * a[pi + k];
        a[pi + j] = s;
      }
      const lim = i < nElim ? i : nElim;
      let dii = a[pi + i];
      const scale = Math.abs(dii);
      for (let j = fi; j < lim; j++) {
        const g = a[pi + j];
        const l = g / a[ptr[j + 1] - 1];
        a[pi + j] = l;
        dii -= l * g;
      }
      if (i < nElim && !(dii > 1e-13 * scale)) {
        throw new FemInputError(
          'stiffness',
          `stiffness matrix is not positive definite (equation ${i})`,
        );
      }
      a[pi + i] = dii;
    }
    this.nElim = nElim;
  }

  /** Solves A x = b in skyline equation order after a full factor(); b is overwritten with x. */
  solveInPlace(x: Float64Array): void {
    const { n, first, ptr, data: a } = this;
    for (let i = 0; i < n; i++) {
      const pi = ptr[i] - first[i];
      let s = x[i];
      for (let k = first[i]; k < i; k++) s -= a[pi + k] * x[k];
      x[i] = s;
    }
    for (let i = 0; i < n; i++) x[i] /= a[ptr[i + 1] - 1];
    this.backSubstitute(x, n);
  }

  /** Solves Lᵀ x = y for the leading `m` equations in place (column-oriented sweep). */
  backSubstitute(x: Float64Array, m: number): void {
    const { first, ptr, data: a } = this;
    for (let i = m - 1; i >= 0; i--) {
      const xi = x[i];
      if (xi === 0) continue;
      const pi = ptr[i] - first[i];
      for (let k = first[i]; k < i; k++) x[k] -= a[pi + k] * xi;
    }
  }

  /**
   * backSubstitute for `k` right-hand sides at once: `x` holds them row-major (m × k, equation
   * i's values at x[i·k .. i·k + k)), so one sweep of the profile serves every column. With
   * `stop` > 0 only equations stop..m−1 are solved (the sweep runs from the last equation down,
   * and each is final when reached).
   */
  backSubstituteBlock(x: Float64Array, m: number, k: number, stop = 0): void {
    const { first, ptr, data: a } = this;
    for (let i = m - 1; i >= stop; i--) {
      const pi = ptr[i] - first[i];
      const xi = i * k;
      for (let q = first[i]; q < i; q++) {
        const l = a[pi + q];
        if (l === 0) continue;
        const xq = q * k;
        for (let c = 0; c < k; c++) x[xq + c] -= l * x[xi + c];
      }
    }
  }
}
