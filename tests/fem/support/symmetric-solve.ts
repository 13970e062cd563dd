import type { CsrMatrix } from '../../../fem/solver/csr';
import { reverseCuthillMcKee } from '../../../fem/solver/rcm';
import { SkylineMatrix } from '../../../fem/solver/skyline';

/**
 * Solves K u = f for a symmetric positive definite K (after constraints) with u = 0 on the DOFs
 * flagged in `fixed` (their reactions are ignored): RCM ordering, skyline LDLᵀ. Returns the full
 * vector u (same layout as f; zeros on fixed DOFs).
 */
export function solveSymmetric(
  k: CsrMatrix,
  f: ArrayLike<number>,
  fixed: Uint8Array,
): Float64Array {
  const include = new Uint8Array(k.n);
  for (let i = 0; i < k.n; i++) include[i] = fixed[i] ? 0 : 1;
  const perm = reverseCuthillMcKee(k, include);
  const sky = new SkylineMatrix(k, perm);
  sky.factor();
  const x = new Float64Array(perm.length);
  for (let i = 0; i < perm.length; i++) x[i] = f[perm[i]];
  sky.solveInPlace(x);
  const u = new Float64Array(k.n);
  for (let i = 0; i < perm.length; i++) u[perm[i]] = x[i];
  return u;
}
