import { Matrix } from 'ml-matrix';
import { assembleStiffness } from './assembly';
import { condense } from '../solver/condense';
import { centroidStresses } from '../elements/element-stresses';
import { FemInputError } from '../errors';
import { MESH_LEVELS } from '../mesh/mesh-levels';
import { quarterEllipseMesh } from '../mesh/quarter-ellipse';
import type { CondensedBody, StressSample, UnitBodyKey } from '../types';

/** Candidate contact nodes are the surface nodes with r ≤ this (units of the equatorial radius). */
export const CONTACT_REACH = 0.6;

/**
 * A condensed unit body with its mesh exposed. Node i of the quarter section is at
 * (nodeR[i], nodeZ[i]) (unit body, m); full displacement vectors are [u_r0, u_z0, u_r1, u_z1, …].
 */
export interface FemBody extends CondensedBody {
  nodeR: Float64Array;
  nodeZ: Float64Array;
  /** element connectivity, 4 nodes per quad, counter-clockwise */
  quads: Int32Array;
  /** all surface nodes from the pole to the equator; the contact nodes are its first K.rows */
  surfaceNodes: Int32Array;
  /** mesh node index of each candidate contact node (same order as contactR / contactZ / K) */
  contactNodes: Int32Array;
  /**
   * Area (m², unit body) each contact node carries, projected on the pad plane: the consistent
   * nodal share ∫ N_i dA of the segments to its surface neighbours, so a uniform pressure p gives
   * f_i = −p·area_i exactly (axisymmetric: ∫ N_i 2πr dr, the pole node gets πh²/3; plane strain:
   * half of each neighbouring strip, per metre of thickness of the half slice). Pressure ≈ −f_i / area_i.
   */
  contactArea: Float64Array;
  /**
   * Multiply the sum of the contact-node forces by this for the whole pad force: 1 for the
   * axisymmetric model (ring forces), 2 for plane strain (the model is the half slice x ≥ 0).
   */
  forceFactor: number;
}

/** Builds (uncached) the condensed unit body of a validated key: E = 1 Pa, equatorial radius 1 m. */
export function buildCondensedBody(key: UnitBodyKey): FemBody {
  const mesh = quarterEllipseMesh(key.aspect, MESH_LEVELS[key.level]);
  const { nodeR, nodeZ, quads, surface, axis, midplane } = mesh;
  const nNodes = nodeR.length;
  const k = assembleStiffness(mesh, key.model, 1, key.poisson);
  const fixed = new Uint8Array(2 * nNodes);
  for (const v of axis) fixed[2 * v] = 1;
  for (const v of midplane) fixed[2 * v + 1] = 1;
  let nc = 0;
  while (nc < surface.length && nodeR[surface[nc]] <= CONTACT_REACH + 1e-9) nc++;
  const contactNodes = surface.slice(0, nc);
  const keep = contactNodes.map((v) => 2 * v + 1);
  // RCM from the pole: its levels follow the rings, and the kept rows come right after them.
  const sys = condense(k, keep, fixed, [keep[0]]);

  const kMat = new Matrix(nc, nc);
  for (let i = 0; i < nc; i++) {
    for (let j = 0; j < nc; j++) {
      kMat.set(i, j, 0.5 * (sys.kstar[i * nc + j] + sys.kstar[j * nc + i]));
    }
  }
  const axi = key.model === 'axisymmetric';
  const contactArea = new Float64Array(nc);
  for (let i = 0; i < nc; i++) {
    // Consistent share of a unit pressure on the projected segments either side (N_i r linear × linear).
    const r0 = nodeR[surface[i]];
    const rIn = i === 0 ? r0 : nodeR[surface[i - 1]];
    const rOut = nodeR[surface[i + 1]];
    contactArea[i] = axi
      ? (Math.PI / 3) * ((r0 - rIn) * (rIn + 2 * r0) + (rOut - r0) * (2 * r0 + rOut))
      : 0.5 * (rOut - rIn);
  }
  const dofs = 2 * nNodes;
  return {
    key: { ...key },
    nodes: nNodes,
    dofs,
    contactR: Float64Array.from(contactNodes, (v) => nodeR[v]),
    contactZ: Float64Array.from(contactNodes, (v) => nodeZ[v]),
    K: kMat,
    recover(uc: Float64Array): Float64Array {
      if (uc.length !== nc) {
        throw new FemInputError('uc', `uc must hold ${nc} contact displacements`);
      }
      requireAllFinite('uc', uc);
      return sys.recover(uc);
    },
    stresses(u: Float64Array): StressSample[] {
      if (u.length !== dofs) throw new FemInputError('u', `u must hold ${dofs} displacements`);
      requireAllFinite('u', u);
      return centroidStresses(mesh, key.model, 1, key.poisson, u);
    },
    nodeR,
    nodeZ,
    quads,
    surfaceNodes: surface,
    contactNodes,
    contactArea,
    forceFactor: axi ? 1 : 2,
  };
}

function requireAllFinite(field: string, v: Float64Array): void {
  for (let i = 0; i < v.length; i++) {
    if (!Number.isFinite(v[i])) throw new FemInputError(field, `${field} must hold finite numbers`);
  }
}
