import { FemConvergenceError, FemInputError } from '../errors';
import type { ContactSystem } from './compliance';
import { solveSubmatrixSpd } from './dense-cholesky';

/** Options of one contact solve. */
export interface ContactOptions {
  /** initial axial gap g_i ≥ 0 (m) between node i and the undisplaced pad; Infinity = unreachable */
  gap: Float64Array;
  /** pad travel d (m) toward the centre; the pad face sits at g_i − d in displacement terms */
  travel: number;
  /** series compliance of the facing per node (m/N), e.g. t_l / (E_l A_i); zero or absent = rigid */
  facingCompliance?: Float64Array;
  /** active set to start from (warm start); default: nodes whose initial gap the travel closes */
  initialActive?: Uint8Array;
  /** iteration limit; default 2·size + 20 */
  maxIterations?: number;
}

/** Converged contact state. Force p_i ≥ 0 is the compressive load the pad puts on node i. */
export interface ContactSolution {
  active: Uint8Array;
  /** p_i ≥ 0 (N): the body feels f_z = −p_i */
  force: Float64Array;
  /** axial displacement u_i (m), negative toward the centre: u = −C p */
  displacement: Float64Array;
  /** remaining gap s_i ≥ 0 (m) between node and facing surface; 0 in contact, Infinity if unreachable */
  gap: Float64Array;
  iterations: number;
  added: number;
  released: number;
}

/**
 * Unilateral frictionless contact by an active set, as the complementarity problem
 * s = (g − d) + (C + D_f) p, s ≥ 0, p ≥ 0, s·p = 0 (D_f: facing compliance in series).
 * Active nodes get their displacement imposed (s_i = 0), solved on the active submatrix;
 * nodes with tensile force are released and penetrating nodes added, all at once; if a set
 * recurs, it switches to flipping the lowest-index violation (Murty's rule, finite for the
 * positive-definite C). Throws FemConvergenceError past the iteration limit.
 */
export function solveContact(system: ContactSystem, options: ContactOptions): ContactSolution {
  const n = system.size;
  const { gap, travel } = options;
  if (gap.length !== n) throw new FemInputError('gap', 'gap must have one entry per contact node');
  const facing = options.facingCompliance ?? new Float64Array(n);
  const q = gap.map((g) => g - travel);
  const reachable = q.map((v) => (Number.isFinite(v) ? 1 : 0));
  const active = startingSet(q, reachable, options.initialActive);
  let scale = travel;
  for (const v of q) if (Number.isFinite(v) && Math.abs(v) > scale) scale = Math.abs(v);
  const tolS = 1e-10 * scale;
  const maxIterations = options.maxIterations ?? 2 * n + 20;
  // Sets already tried, by a 32-bit hash: a collision only switches to Murty's rule early,
  // which still converges.
  const seen = new Set<number>();
  let murty = false;
  let added = 0;
  let released = 0;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const p = solveActive(system, facing, q, active);
    const s = gapsUnder(system, facing, q, p);
    const flips = violations(active, reachable, p, s, tolS);
    if (flips.length === 0) {
      const displacement = closeActive(system, p, s, active);
      return { active, force: p, displacement, gap: s, iterations: iteration, added, released };
    }
    for (const i of murty ? flips.slice(0, 1) : flips) {
      if (active[i]) released++;
      else added++;
      active[i] = active[i] ? 0 : 1;
    }
    const key = hashSet(active);
    if (seen.has(key)) murty = true;
    seen.add(key);
  }
  throw new FemConvergenceError(
    `contact active set did not settle within ${maxIterations} iterations (travel ${travel} m)`,
  );
}

/** FNV-1a hash of an active set (T. Fowler, L. C. Noll, K.-P. Vo, 1991 [from memory]). */
function hashSet(active: Uint8Array): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < active.length; i++) h = Math.imul(h ^ active[i], 0x01000193);
  return h >>> 0;
}

/** The warm-start set if given, else the nodes the travel would make penetrate; never unreachable ones. */
function startingSet(q: Float64Array, reachable: Float64Array, warm?: Uint8Array): Uint8Array {
  const active = new Uint8Array(q.length);
  for (let i = 0; i < q.length; i++) {
    const start = warm ? warm[i] === 1 : q[i] < 0;
    active[i] = start && reachable[i] ? 1 : 0;
  }
  return active;
}

/** Gaps s = q + (C + D_f) p under the forces p. */
function gapsUnder(
  system: ContactSystem,
  facing: Float64Array,
  q: Float64Array,
  p: Float64Array,
): Float64Array {
  return addCompliance(
    system,
    p,
    q.map((qi, i) => qi + facing[i] * p[i]),
  );
}

/** start_i + Σ_j C_ij p_j, summed in j order over the nonzero p_j (most nodes are free). */
function addCompliance(system: ContactSystem, p: Float64Array, start: Float64Array): Float64Array {
  const n = system.size;
  const C = system.flat;
  const loaded: number[] = [];
  for (let j = 0; j < n; j++) if (p[j] !== 0) loaded.push(j);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let v = start[i];
    for (const j of loaded) v += C[i * n + j] * p[j];
    out[i] = v;
  }
  return out;
}

/** Active nodes pulling on the pad and reachable free nodes penetrating it, in index order. */
function violations(
  active: Uint8Array,
  reachable: Float64Array,
  p: Float64Array,
  s: Float64Array,
  tolS: number,
): number[] {
  let largest = 0;
  for (const v of p) if (Math.abs(v) > largest) largest = Math.abs(v);
  const tolP = 1e-10 * largest;
  const flips: number[] = [];
  for (let i = 0; i < active.length; i++) {
    if (active[i] && p[i] < -tolP) flips.push(i);
    else if (!active[i] && reachable[i] && s[i] < -tolS) flips.push(i);
  }
  return flips;
}

/** Displacements u = −C p of the converged state; the active gaps are set to exactly zero. */
function closeActive(
  system: ContactSystem,
  p: Float64Array,
  s: Float64Array,
  active: Uint8Array,
): Float64Array {
  active.forEach((a, i) => a && (s[i] = 0));
  return addCompliance(system, p, new Float64Array(p.length)).map((v) => 0 - v);
}

/** Forces on the active set with every active gap closed: (C + D_f)_AA p_A = −q_A. */
function solveActive(
  system: ContactSystem,
  facing: Float64Array,
  q: Float64Array,
  active: Uint8Array,
): Float64Array {
  const idx: number[] = [];
  active.forEach((a, i) => a && idx.push(i));
  const p = new Float64Array(active.length);
  if (idx.length === 0) return p;
  const rhs = Float64Array.from(idx, (i) => -q[i]);
  const x = solveSubmatrixSpd(system.flat, system.size, idx, facing, rhs);
  if (!x) throw new FemConvergenceError('contact submatrix lost positive definiteness');
  idx.forEach((i, k) => (p[i] = x[k]));
  return p;
}
