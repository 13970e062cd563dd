/**
 * Stage 5 of the squeeze pipeline: the largest subsurface shear under the contact of stage 4,
 * and the state summary of one travel.
 */
import type { SqueezeInput } from './01-input';
import { preparePressure, pressureAt, type PressureStage } from './04-pressure';
import { getShearField, maxShearUnder, type ShearField } from './shear-field';

/** The pressure stage plus the unit body's stress influence (cached per body). */
export interface ShearStage extends PressureStage {
  shearField: ShearField;
}

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
  /**
   * largest Tresca shear (σ1 − σ3)/2 at the element centroids under the contact (r ≤ a), Pa;
   * null when not computed, or when it could not be sampled (see maxShearUnavailable)
   */
  maxShear: number | null;
  /** depth of that shear below the undeformed surface, m; null with maxShear */
  maxShearDepth: number | null;
  /** why the shear was asked for but could not be sampled, in plain words; else null */
  maxShearUnavailable: string | null;
  /** lift ratio μ·2F / (SF·m·(g + a)), set by the liftability stage; null without its inputs */
  liftRatio: number | null;
  /** contact points in contact (surface nodes, and the pad's edge point when it touches) */
  activeNodes: number;
  /** largest compression of the pad's facing over its thickness (0.2 = 20 %); null if rigid */
  facingStrain: number | null;
}

/** A state with the nodal pressures (Pa) and the active set it came from. */
export interface StateAt {
  state: SqueezeState;
  pressure: Float64Array;
  active: Uint8Array;
}

/** Prepares the pressure stage (stage 4) with the stress influence of its body. */
export function prepareShear(input: SqueezeInput): ShearStage {
  const stage = preparePressure(input);
  return { ...stage, shearField: getShearField(stage.body, stage.nodeSystem) };
}

/** The state at `travel` (m), warm-started from `warm`; shear only if `withShear` (it costs). */
export function stateAt(
  stage: ShearStage,
  travel: number,
  warm: Uint8Array | undefined,
  withShear: boolean,
): StateAt {
  const at = pressureAt(stage, travel, warm);
  const R = stage.case.equatorialRadius;
  let maxShear: number | null = null;
  let maxShearDepth: number | null = null;
  let maxShearUnavailable: string | null = null;
  if (withShear && at.force > 0) {
    // u_real = C_unit p̃ with p̃ = p / stiffnessScale, and the unit body's displacement is u_real / R.
    const unitForce = at.solution.nodeForce.map((f) => f / (stage.stiffnessScale * R));
    const under = maxShearUnder(stage.shearField, unitForce, at.contactRadius / R);
    if (under.peak) {
      maxShear = under.peak.shear * stage.bodyModulus;
      maxShearDepth = under.peak.depth * R;
    } else maxShearUnavailable = under.reason;
  }
  const state: SqueezeState = {
    travel,
    force: at.force,
    contactRadius: at.contactRadius,
    peakPressure: at.peakPressure,
    meanPressure: at.meanPressure,
    maxShear,
    maxShearDepth,
    maxShearUnavailable,
    liftRatio: null,
    activeNodes: at.solution.active.reduce((s, x) => s + x, 0),
    facingStrain: at.solution.facingStrain,
  };
  return { state, pressure: at.pressure, active: at.solution.active };
}
