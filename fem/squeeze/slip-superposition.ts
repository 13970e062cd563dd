import { monotoneRoot } from '../solver/monotone-root';
import { requireNonNegative, requirePositive } from '../validate';

/** Normal contact at one load: force P (N, N/m in plane strain), radius a (m), nodal pressure (Pa). */
export interface NormalContactState {
  force: number;
  contactRadius: number;
  pressure: Float64Array;
}

/** One contact node of the slip map: stick inside the stick radius, slip in the annulus. */
export interface SlipNode {
  /** radius from the axis, m */
  r: number;
  /** normal pressure p, Pa */
  pressure: number;
  /** normal pressure p* of the smaller contact whose radius is the stick radius, Pa */
  stickPressure: number;
  /** tangential traction q = μ(p − p*), Pa, in the direction of the load; 0 ≤ q ≤ μp */
  traction: number;
  state: 'stick' | 'slip' | 'open';
}

/** Partial slip under a tangential load T at constant normal load P (SI, N or N/m, m, Pa). */
export interface SlipMap {
  tangentialLoad: number;
  friction: number;
  normalForce: number;
  /** T / (μP): below 1 the grip holds, with a stick zone; at or above 1 it slides; null at P = 0 */
  utilisation: number | null;
  /** true exactly when T ≥ μP: gross sliding, the grip fails */
  grossSliding: boolean;
  contactRadius: number;
  /** stick radius c (half-width in plane strain), m; 0 under gross sliding */
  stickRadius: number;
  /** normal force P* = P − T/μ of the contact of radius c, N (N/m) */
  stickForce: number;
  /** the slip annulus c < r ≤ a, m */
  slipAnnulus: { inner: number; outer: number };
  nodes: SlipNode[];
}

/** Loading history: the normal contact at parameter s in (0, sMax], force rising with s from 0. */
export type ContactHistory = (s: number) => NormalContactState;

/**
 * Ciavarella–Jäger superposition (M. Ciavarella, Int. J. Solids Struct. 35:2349, 1998, plane, and
 * J. Appl. Mech. 65:998, 1998, three-dimensional; J. Jäger, J. Tribol. 120:677, 1998 — volumes
 * and pages [from memory]): under a tangential load T applied after the normal load P, the
 * traction is q = μ[p(r) − p*(r)], p* the normal pressure of the same bodies at the smaller load
 * whose contact radius is the stick radius c. Then ∫q dA = μ(P − P*) = T fixes P* = P − T/μ, and
 * c is the contact radius of the history at P*, found by a bracketed secant search on s. Assumes Coulomb
 * friction, normal–tangential uncoupling (Mindlin's approximation: exact for elastically similar
 * bodies; for a rigid pad it drops a coupling ∝ (1 − 2ν), nil as ν → 0.5 [from memory]) and a
 * contact that grows with load. Gross sliding exactly when T ≥ μP: c = 0 and
 * q = μp everywhere. Nodes: stick where p > 0 and r ≤ c, slip where p > 0 and r > c, else open.
 * @throws FemInputError naming 'tangentialLoad' or 'friction'
 */
export function ciavarellaJager(
  r: Float64Array,
  current: NormalContactState,
  history: ContactHistory,
  sMax: number,
  tangentialLoad: number,
  friction: number,
): SlipMap {
  const T = requireNonNegative('tangentialLoad', tangentialLoad);
  const mu = requirePositive('friction', friction);
  const P = current.force;
  const a = current.contactRadius;
  const grossSliding = T >= mu * P;
  const stickForce = grossSliding ? 0 : P - T / mu;
  let stick: NormalContactState;
  if (grossSliding) stick = { force: 0, contactRadius: 0, pressure: new Float64Array(r.length) };
  else if (T === 0) stick = current;
  else stick = history(stickParameter(history, stickForce, sMax, P));
  const c = grossSliding ? 0 : Math.min(stick.contactRadius, a);
  const nodes = Array.from(r, (ri, i): SlipNode => {
    const p = current.pressure[i];
    const ps = Math.min(stick.pressure[i], p);
    const state = p > 0 ? (ri <= c && !grossSliding ? 'stick' : 'slip') : 'open';
    return { r: ri, pressure: p, stickPressure: ps, traction: mu * (p - ps), state };
  });
  return {
    tangentialLoad: T,
    friction: mu,
    normalForce: P,
    utilisation: P > 0 ? T / (mu * P) : null,
    grossSliding,
    contactRadius: a,
    stickRadius: c,
    stickForce,
    slipAnnulus: { inner: c, outer: a },
    nodes,
  };
}

/**
 * Least parameter s in (0, sMax] whose force reaches `target` (0 < target ≤ the force at sMax):
 * the history starts unloaded (no force at s = 0). Stops within 1e-12 of the target force (a
 * Hertz contact radius then within about 3e-13 of itself, as a ∝ P^{1/3}) or a bracket of
 * 1e-12 sMax.
 */
function stickParameter(
  history: ContactHistory,
  target: number,
  sMax: number,
  forceAtMax: number,
): number {
  return monotoneRoot(
    (s) => history(s).force,
    target,
    { lo: 0, hi: sMax, fLo: 0, fHi: forceAtMax },
    { xTol: 1e-12 * sMax, fTol: 1e-12 * target },
  );
}
