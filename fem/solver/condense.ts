import type { CsrMatrix } from './csr';
import { reverseCuthillMcKee } from './rcm';
import { SkylineMatrix } from './skyline';

/** A symmetric system condensed onto its kept DOFs (Guyan static condensation). */
export interface CondensedSystem {
  /** number of kept DOFs */
  nKeep: number;
  /** K* = K_cc − K_cf K_ff⁻¹ K_fc, dense row-major nKeep × nKeep, kept DOFs in the given order */
  kstar: Float64Array;
  /** full DOF vector from the kept DOFs' values, no load on the condensed DOFs, 0 on fixed DOFs */
  recover(uc: ArrayLike<number>): Float64Array;
  /** stored entries of the skyline factor (memory measure) */
  profile: number;
}

/**
 * Static condensation (Guyan 1965; Cook et al., Concepts and Applications of FEA):
 * K* = K_cc − K_cf K_ff⁻¹ K_fc and u_f = −K_ff⁻¹ K_fc u_c, for kept DOFs `keep` (c), DOFs flagged
 * in `fixed` held at zero, and all others condensed (f).
 *
 * The kept DOFs are ordered after the condensed ones, which are in RCM order (from `seeds` if
 * given, else a pseudo-peripheral root; a seed next to the kept DOFs keeps their rows short), and
 * Gauss elimination runs over the condensed block only: the trailing block of the
 * skyline then is K* itself, and with K_fc = L_ff D L_cfᵀ recovery is one back substitution,
 * u_f = −L_ffᵀ⁻¹ (L_cfᵀ u_c). Same algebra as solving K_ff X = K_fc column by column, less work.
 */
export function condense(
  k: CsrMatrix,
  keep: ArrayLike<number>,
  fixed: Uint8Array,
  seeds?: ArrayLike<number>,
): CondensedSystem {
  const nc = keep.length;
  const nTotal = k.n;
  const include = new Uint8Array(k.n);
  for (let i = 0; i < k.n; i++) include[i] = fixed[i] ? 0 : 1;
  for (let i = 0; i < nc; i++) include[keep[i]] = 0;
  const orderF = reverseCuthillMcKee(k, include, seeds);
  const nf = orderF.length;
  const perm = new Int32Array(nf + nc);
  perm.set(orderF);
  for (let i = 0; i < nc; i++) perm[nf + i] = keep[i];
  const sky = new SkylineMatrix(k, perm);
  sky.factor(nf);
  const { first, ptr, data } = sky;

  const kstar = new Float64Array(nc * nc);
  for (let i = 0; i < nc; i++) {
    const row = nf + i;
    const base = ptr[row] - first[row];
    for (let j = 0; j <= i; j++) {
      const col = nf + j;
      const v = col >= first[row] ? data[base + col] : 0;
      kstar[i * nc + j] = v;
      kstar[j * nc + i] = v;
    }
  }

  const recover = (uc: ArrayLike<number>): Float64Array => {
    const x = new Float64Array(nf);
    for (let i = 0; i < nc; i++) {
      const row = nf + i;
      const base = ptr[row] - first[row];
      const ui = uc[i];
      for (let kk = first[row]; kk < nf; kk++) x[kk] -= data[base + kk] * ui;
    }
    sky.backSubstitute(x, nf);
    const u = new Float64Array(nTotal);
    for (let i = 0; i < nf; i++) u[orderF[i]] = x[i];
    for (let i = 0; i < nc; i++) u[keep[i]] = uc[i];
    return u;
  };
  return { nKeep: nc, kstar, recover, profile: sky.profile };
}
