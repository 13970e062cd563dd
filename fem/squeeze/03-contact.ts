import { getCondensedBody, type FemBody } from '../body/cache';
import {
  createContactSystem,
  solveContact,
  type ContactSolution,
  type ContactSystem,
} from '../solver/active-set';
import { FemInputError } from '../errors';
import { fruitMass, liftRatio, type GripRule } from './grip';
import { padLift, padReach } from './pad';
import { contactRadius, recoverPressure, surfaceWeights } from './pressure-recovery';
import type { SqueezeCase } from './01-input';
import { getShearField, maxShearUnder } from './shear-field';

/**
 * One squeeze state, SI. Plane strain gives forces in N per metre of slice and the contact
 * half-width as `contactRadius`. Pressures and shear are compressive/positive magnitudes.
 */
export interface SqueezeState {
  /** travel of each pad toward the centre, m */
  travel: number;
  /** normal force of one pad on the fruit, N (N/m in plane strain), positive */
  force: number;
  /** contact radius a (half-width in plane strain), m */
  contactRadius: number;
  /** largest recovered nodal contact pressure, Pa */
  peakPressure: number;
  /** force / (π a²), or force / (2a) in plane strain, Pa */
  meanPressure: number;
  /** largest Tresca shear (σ1 − σ3)/2 under the contact (r ≤ a), Pa; null when not computed */
  maxShear: number | null;
  /** depth of that shear below the undeformed surface, m; null when not computed */
  maxShearDepth: number | null;
  /** lift ratio μ·2F / (SF·m·(g + a)); null without liftability inputs */
  liftRatio: number | null;
  /** contact nodes in contact */
  activeNodes: number;
}

/** A squeeze case bound to its cached condensed body, ready for contact solves at any travel. */
export interface PreparedSqueeze {
  case: SqueezeCase;
  body: FemBody;
  system: ContactSystem;
  /** real radii of the contact nodes, m */
  r: Float64Array;
  /** initial axial gap between each node and the pad, m (Infinity beyond the pad) */
  gap: Float64Array;
  /** facing compliance per node in unit-body force units (see solveAt) */
  facing: Float64Array | undefined;
  /** K_real = stiffnessScale · K_unit: E·R (axisymmetric) or E (plane strain, per metre) */
  stiffnessScale: number;
  rule: GripRule | null;
}

const systems = new WeakMap<FemBody, ContactSystem>();

/** Binds a validated case to the cached unit body (the body and its compliance are reused). */
export function prepareSqueeze(c: SqueezeCase): PreparedSqueeze {
  const body = getCondensedBody({
    model: c.model,
    aspect: c.aspect,
    poisson: c.poisson,
    level: c.mesh,
  });
  let system = systems.get(body);
  if (!system) {
    system = createContactSystem(body.K);
    systems.set(body, system);
  }
  const R = c.equatorialRadius;
  const r = body.contactR.map((x) => x * R);
  const zPole = body.contactZ[0] * R;
  const gap = r.map((ri, i) => zPole - body.contactZ[i] * R + padLift(c.pad, ri));
  const stiffnessScale = c.model === 'axisymmetric' ? c.modulus * R : c.modulus;
  // Winkler facing: spring k_i = (E_l / t_l)·A_i per node; in the solve's scaled force units
  // (p̃ = p / stiffnessScale) its compliance becomes stiffnessScale / k_i.
  const kf = c.facingStiffness;
  const area = surfaceWeights(r, c.model).area;
  const facing = kf === null ? undefined : area.map((A) => stiffnessScale / (kf * A));
  const rule = c.lift && {
    mass: fruitMass(c.model, c.equatorialRadius, c.axialRadius, c.lift.density),
    friction: c.lift.friction,
    safetyFactor: c.lift.safetyFactor,
    accelG: c.lift.accelG,
  };
  return { case: c, body, system, r, gap, facing, stiffnessScale, rule };
}

/**
 * Contact at pad travel `travel` (m), optionally warm-started from an active set. The solve runs
 * on the unit compliance; returned forces are in N (N/m), displacements and gaps in m.
 */
export function solveAt(prep: PreparedSqueeze, travel: number, warm?: Uint8Array): ContactSolution {
  const sol = solveContact(prep.system, {
    gap: prep.gap,
    travel,
    facingCompliance: prep.facing,
    initialActive: warm,
  });
  const n = sol.active.length;
  if (sol.active[n - 1] === 1) {
    throw new FemInputError(
      'travel',
      'travel spreads the contact past the modelled contact zone; reduce travel',
    );
  }
  const force = sol.force.map((p) => p * prep.stiffnessScale);
  return { ...sol, force };
}

/**
 * Total normal force of one pad, N: the sum of the whole-ring nodal forces (axisymmetric); in plane
 * strain twice the sum over the half-slice x ≥ 0 of the quarter model, N per metre.
 */
export function padForce(prep: PreparedSqueeze, sol: ContactSolution): number {
  const half = sol.force.reduce((s, p) => s + p, 0);
  return half * prep.body.forceFactor;
}

/** Nodal pressures (Pa) and the state summary of a contact solution at `travel` (m). */
export function describeState(
  prep: PreparedSqueeze,
  sol: ContactSolution,
  travel: number,
  withShear: boolean,
): { state: SqueezeState; pressure: Float64Array } {
  const c = prep.case;
  const pressure = recoverPressure(prep.r, sol.force, sol.active, c.model);
  const force = padForce(prep, sol);
  const a = contactRadius(prep.r, sol.gap, sol.active, padReach(c.pad));
  const meanPressure =
    a > 0 ? (c.model === 'axisymmetric' ? force / (Math.PI * a * a) : force / (2 * a)) : 0;
  let maxShear: number | null = null;
  let maxShearDepth: number | null = null;
  if (withShear) {
    const R = c.equatorialRadius;
    const peak = maxShearUnder(
      getShearField(prep.body),
      sol.displacement.map((u) => u / R),
      a / R,
    );
    maxShear = peak.shear * c.modulus;
    maxShearDepth = peak.depth * R;
  }
  const state: SqueezeState = {
    travel,
    force,
    contactRadius: a,
    peakPressure: Math.max(...pressure),
    meanPressure,
    maxShear,
    maxShearDepth,
    liftRatio: prep.rule ? liftRatio(force, prep.rule) : null,
    activeNodes: sol.active.reduce((s, x) => s + x, 0),
  };
  return { state, pressure };
}
