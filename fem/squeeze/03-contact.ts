/**
 * Stage 3 of the squeeze pipeline: unilateral pad contact on the body of stage 2, at any travel.
 */
import type { FemBody } from '../body/cache';
import { FemInputError } from '../errors';
import type { SqueezeInput } from './01-input';
import { prepareBody, type BodyStage } from './02-body';
import { solveContact, type ContactSolution } from '../solver/active-set';
import { createContactSystem, type ContactSystem } from '../solver/compliance';
import { surfaceWeights } from './pressure-recovery';

/** The body stage plus its contact compliance and the facing springs. */
export interface ContactStage extends BodyStage {
  /** compliance of the unit body's contact nodes (shared per body) */
  system: ContactSystem;
  /** facing compliance per node in unit-body force units (see prepareContact); undefined = rigid */
  facing: Float64Array | undefined;
}

const systems = new WeakMap<FemBody, ContactSystem>();

/** Prepares the body (stage 2) and its contact system; the compliance is cached per body. */
export function prepareContact(input: SqueezeInput): ContactStage {
  const stage = prepareBody(input);
  const { body, r, stiffnessScale } = stage;
  let system = systems.get(body);
  if (!system) {
    system = createContactSystem(body.K);
    systems.set(body, system);
  }
  // Winkler facing: spring k_i = (E_l / t_l)·A_i per node; in the solve's scaled force units
  // (p̃ = p / stiffnessScale) its compliance becomes stiffnessScale / k_i.
  const kf = stage.case.facingStiffness;
  const area = surfaceWeights(r, stage.case.model).area;
  const facing = kf === null ? undefined : area.map((A) => stiffnessScale / (kf * A));
  return { ...stage, system, facing };
}

/**
 * Contact at pad travel `travel` (m), optionally warm-started from an active set. The solve runs
 * on the unit compliance; returned forces are in N (N/m), displacements and gaps in m.
 * @throws FemInputError('travel') when the contact reaches the last candidate node
 */
export function solveAt(stage: ContactStage, travel: number, warm?: Uint8Array): ContactSolution {
  const sol = solveContact(stage.system, {
    gap: stage.gap,
    travel,
    facingCompliance: stage.facing,
    initialActive: warm,
  });
  const n = sol.active.length;
  if (sol.active[n - 1] === 1) {
    throw new FemInputError(
      'travel',
      'travel spreads the contact past the modelled contact zone; reduce travel',
    );
  }
  const force = sol.force.map((p) => p * stage.stiffnessScale);
  return { ...sol, force };
}

/**
 * Total normal force of one pad, N: the sum of the whole-ring nodal forces (axisymmetric); in plane
 * strain twice the sum over the half-slice x ≥ 0 of the quarter model, N per metre.
 */
export function padForce(stage: ContactStage, sol: ContactSolution): number {
  const half = sol.force.reduce((s, p) => s + p, 0);
  return half * stage.body.forceFactor;
}
