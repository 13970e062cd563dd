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
import { facingLayerCompliance } from '../body/facing-layer';
import { pointCompliance, pointsToNodes } from './contact-points';
import { padReach } from './pad';

/** The pad's facing layer at the contact points it covers, in the solve's force units. */
export interface FacingStage {
  /** points 0..n−1 lie on the facing (the rest are beyond the pad) */
  n: number;
  /** compression of the layer per unit solve force, m per (N / stiffnessScale), row-major n × n */
  compliance: Float64Array;
}

/** The body stage plus the contact compliance of its points (fruit and facing in series). */
export interface ContactStage extends BodyStage {
  /** compliance at the contact points, fruit plus facing (shared per body for a bare pad) */
  system: ContactSystem;
  /** compliance of the unit body at its contact nodes (shared per body) */
  nodeSystem: ContactSystem;
  /** the facing layer, or null for a rigid pad face */
  facing: FacingStage | null;
}

/** A contact solution at the points, with the contact nodes' loads and displacements. */
export interface StageSolution extends ContactSolution {
  /** axial load on each contact node, N (N/m), ≥ 0 in sum */
  nodeForce: Float64Array;
  /** axial displacement of each contact node, m (negative toward the centre) */
  nodeDisplacement: Float64Array;
  /** largest compression of the facing over its thickness (0.2 = 20 %); null without a facing */
  facingStrain: number | null;
}

const systems = new WeakMap<FemBody, ContactSystem>();
const layers = new WeakMap<FemBody, Map<string, Float64Array>>();

/**
 * Prepares the body (stage 2) and its contact system; the node compliance is cached per body.
 * A facing adds its own compliance in series at the points it covers: the fruit and the layer
 * are two elastic bodies pressed together through a frictionless interface.
 */
export function prepareContact(input: SqueezeInput): ContactStage {
  const stage = prepareBody(input);
  const { body, points } = stage;
  let nodeSystem = systems.get(body);
  if (!nodeSystem) {
    nodeSystem = createContactSystem(body.K);
    systems.set(body, nodeSystem);
  }
  const facing = facingOf(stage);
  if (points.edge < 0 && !facing) return { ...stage, system: nodeSystem, nodeSystem, facing };
  const m = points.r.length;
  const c = pointCompliance(points, nodeSystem.flat, nodeSystem.size);
  if (facing) {
    for (let i = 0; i < facing.n; i++) {
      for (let j = 0; j < facing.n; j++) c[i * m + j] += facing.compliance[i * facing.n + j];
    }
  }
  return { ...stage, system: contactSystemFromCompliance(c, m), nodeSystem, facing };
}

/** The facing layer's compliance at the points it covers (cached per body and layer). */
function facingOf(stage: BodyStage): FacingStage | null {
  const f = stage.case.facing;
  if (!f) return null;
  const R = stage.case.equatorialRadius;
  const reach = stage.points.gap.findIndex((g) => !Number.isFinite(g));
  const n = reach < 0 ? stage.points.r.length : reach;
  const radii = stage.points.r.slice(0, n).map((r) => r / R);
  const thickness = f.thickness / R;
  const pad = padReach(stage.case.pad) / R;
  const outer = Number.isFinite(pad) ? pad : radii[n - 1] + 4 * thickness + 0.1;
  const id = [thickness, f.poisson, outer, ...radii].join('|');
  let perBody = layers.get(stage.body);
  if (!perBody) layers.set(stage.body, (perBody = new Map()));
  let unit = perBody.get(id);
  if (!unit) {
    unit = facingLayerCompliance({
      model: stage.case.model,
      thickness,
      poisson: f.poisson,
      outer,
      radii,
    });
    if (perBody.size >= 8) perBody.delete(perBody.keys().next().value as string);
    perBody.set(id, unit);
  }
  // Unit layer (E = 1 Pa, R = 1 m) to the solve's units: ×stiffnessScale / (E_l·R) or / E_l.
  const layerScale = stage.case.model === 'axisymmetric' ? f.modulus * R : f.modulus;
  const ratio = stage.stiffnessScale / layerScale;
  return { n, compliance: unit.map((x) => x * ratio) };
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
  return { ...sol, force, nodeForce, nodeDisplacement, facingStrain: facingStrain(stage, sol) };
}

/**
 * Total normal force of one pad, N: the sum of the whole-ring point forces (axisymmetric); in
 * plane strain twice the sum over the half-slice x ≥ 0 of the quarter model, N per metre.
 */
export function padForce(stage: ContactStage, sol: ContactSolution): number {
  const half = sol.force.reduce((s, p) => s + p, 0);
  return half * stage.body.forceFactor;
}

/** Largest compression of the facing layer over its thickness under the solved point forces. */
function facingStrain(stage: ContactStage, sol: ContactSolution): number | null {
  const f = stage.facing;
  if (!f || !stage.case.facing) return null;
  let worst = 0;
  for (let i = 0; i < f.n; i++) {
    let w = 0;
    for (let j = 0; j < f.n; j++) w += f.compliance[i * f.n + j] * sol.force[j];
    worst = Math.max(worst, w);
  }
  return worst / stage.case.facing.thickness;
}
