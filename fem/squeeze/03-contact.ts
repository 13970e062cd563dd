/**
 * Stage 3 of the squeeze pipeline: unilateral pad contact on the body of stage 2, at any travel.
 */
import type { FemBody } from '../body/cache';
import { FemInputError } from '../errors';
import type { SqueezeInput } from './01-input';
import { prepareBody, type BodyStage } from './02-body';
import { solveContact, type ContactSolution } from '../solver/active-set';
import {
  contactSystemFromCompliance,
  createContactSystem,
  type ContactSystem,
} from '../solver/compliance';
import { pointCompliance, pointsToNodes } from './contact-points';
import { surfaceWeights } from './pressure-recovery';

/** The body stage plus the contact compliance of its points and the facing springs. */
export interface ContactStage extends BodyStage {
  /** compliance of the unit body at the contact points (shared per body when they are its nodes) */
  system: ContactSystem;
  /** compliance of the unit body at its contact nodes (shared per body) */
  nodeSystem: ContactSystem;
  /** facing compliance per point in unit-body force units (see prepareContact); undefined = rigid */
  facing: Float64Array | undefined;
}

/** A contact solution at the points, with the contact nodes' loads and displacements. */
export interface StageSolution extends ContactSolution {
  /** axial load on each contact node, N (N/m), ≥ 0 in sum */
  nodeForce: Float64Array;
  /** axial displacement of each contact node, m (negative toward the centre) */
  nodeDisplacement: Float64Array;
}

const systems = new WeakMap<FemBody, ContactSystem>();

/** Prepares the body (stage 2) and its contact system; the node compliance is cached per body. */
export function prepareContact(input: SqueezeInput): ContactStage {
  const stage = prepareBody(input);
  const { body, r, stiffnessScale, points } = stage;
  let nodeSystem = systems.get(body);
  if (!nodeSystem) {
    nodeSystem = createContactSystem(body.K);
    systems.set(body, nodeSystem);
  }
  const system =
    points.edge < 0
      ? nodeSystem
      : contactSystemFromCompliance(
          pointCompliance(points, nodeSystem.flat, nodeSystem.size),
          points.r.length,
        );
  // Winkler facing: spring k_i = (E_l / t_l)·A_i per node; in the solve's scaled force units
  // (p̃ = p / stiffnessScale) its compliance becomes stiffnessScale / k_i.
  const kf = stage.case.facingStiffness;
  const area = surfaceWeights(r, stage.case.model).area;
  const facing = kf === null ? undefined : area.map((A) => stiffnessScale / (kf * A));
  return { ...stage, system, nodeSystem, facing };
}

/**
 * Contact at pad travel `travel` (m), optionally warm-started from an active set. The solve runs
 * on the unit compliance; returned forces are in N (N/m), displacements and gaps in m.
 * @throws FemInputError('travel') when the contact reaches the last candidate node
 */
export function solveAt(stage: ContactStage, travel: number, warm?: Uint8Array): StageSolution {
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
  const nc = stage.nodeSystem.size;
  const unitNodeLoad = pointsToNodes(stage.points, sol.force, nc);
  const C = stage.nodeSystem.flat;
  const nodeDisplacement = new Float64Array(nc);
  for (let i = 0; i < nc; i++) {
    let v = 0;
    for (let j = 0; j < nc; j++) if (unitNodeLoad[j] !== 0) v -= C[i * nc + j] * unitNodeLoad[j];
    nodeDisplacement[i] = v;
  }
  const force = sol.force.map((p) => p * stage.stiffnessScale);
  const nodeForce = unitNodeLoad.map((p) => p * stage.stiffnessScale);
  return { ...sol, force, nodeForce, nodeDisplacement };
}

/**
 * Total normal force of one pad, N: the sum of the whole-ring point forces (axisymmetric); in
 * plane strain twice the sum over the half-slice x ≥ 0 of the quarter model, N per metre.
 */
export function padForce(stage: ContactStage, sol: ContactSolution): number {
  const half = sol.force.reduce((s, p) => s + p, 0);
  return half * stage.body.forceFactor;
}
