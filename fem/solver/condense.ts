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
  /**
   * recover() for several kept-DOF vectors in one sweep of the factor, returning only the DOFs
   * `at` (each result lists their values in that order); the sweep stops once they are known.
   */
  recoverAt(ucs: ArrayLike<number>[], at: ArrayLike<number>): Float64Array[];
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
  const position = new Int32Array(nTotal).fill(-1);
  for (let i = 0; i < nf; i++) position[orderF[i]] = i;
  for (let i = 0; i < nc; i++) position[keep[i]] = nf + i;
  const recoverAt = (ucs: ArrayLike<number>[], at: ArrayLike<number>): Float64Array[] => {
    const k = ucs.length;
    const uk = new Float64Array(nc * k);
    ucs.forEach((uc, c) => {
      for (let i = 0; i < nc; i++) uk[i * k + c] = uc[i];
    });
    const x = new Float64Array(nf * k);
    for (let i = 0; i < nc; i++) {
      const row = nf + i;
      const base = ptr[row] - first[row];
      const ui = i * k;
      for (let kk = first[row]; kk < nf; kk++) {
        const l = data[base + kk];
        if (l === 0) continue;
        const xk = kk * k;
        for (let c = 0; c < k; c++) x[xk + c] -= l * uk[ui + c];
      }
    }
    let stop = nf;
    for (let j = 0; j < at.length; j++) {
      if (position[at[j]] >= 0) stop = Math.min(stop, position[at[j]]);
    }
    sky.backSubstituteBlock(x, nf, k, stop);
    return ucs.map((uc, c) => {
      const out = new Float64Array(at.length);
      for (let j = 0; j < at.length; j++) {
        const q = position[at[j]];
        out[j] = q < 0 ? 0 : q < nf ? x[q * k + c] : uc[q - nf];
      }
      return out;
    });
  };
  return { nKeep: nc, kstar, recover, recoverAt, profile: sky.profile };
}
