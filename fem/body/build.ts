import { Matrix } from 'ml-matrix';
import { centroidStresses } from '../elements/element-stresses';
import { FemInputError } from '../errors';
import type { QuarterSectionMesh } from '../mesh/quad-mesh';
import { quarterEllipseMesh } from '../mesh/quarter-ellipse';
import { condense } from '../solver/condense';
import type { CondensedBody, StressSample, UnitBodyKey } from '../types';
import { assembleStiffness } from './assembly';
import { planOf } from './grading';
import { symmetryConstraints } from './symmetry';

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
   * Approximate memory the body holds with what the squeeze caches on it (factor, mesh,
   * condensed stiffness and compliance, stress influence), bytes
   */
  bytes: number;
  /** recover() for several contact-displacement vectors, only at the DOFs `at` (unchecked) */
  recoverAt(ucs: Float64Array[], at: Int32Array): Float64Array[];
  /**
   * Multiply the sum of the contact-node forces by this for the whole pad force: 1 for the
   * axisymmetric model (ring forces), 2 for plane strain (the model is the half slice x ≥ 0).
   */
  forceFactor: number;
}

/** Builds (uncached) the condensed unit body of a validated key: E = 1 Pa, equatorial radius 1 m. */
export function buildCondensedBody(key: UnitBodyKey): FemBody {
  const plan = planOf(key.level, key.contactBand ?? null, key.edgeBand ?? null);
  const mesh = quarterEllipseMesh(key.aspect, plan);
  const k = assembleStiffness(mesh, key.model, 1, key.poisson);
  const contactNodes = candidateContactNodes(mesh);
  const nc = contactNodes.length;
  const keep = contactNodes.map((v) => 2 * v + 1);
  // RCM from the pole: its levels follow the rings, and the kept rows come right after them.
  const sys = condense(k, keep, symmetryConstraints(mesh), [keep[0]]);
  const dofs = 2 * mesh.nodeR.length;
  return {
    key: { ...key },
    nodes: mesh.nodeR.length,
    dofs,
    contactR: Float64Array.from(contactNodes, (v) => mesh.nodeR[v]),
    contactZ: Float64Array.from(contactNodes, (v) => mesh.nodeZ[v]),
    K: symmetricPart(sys.kstar, nc),
    recover(uc: Float64Array): Float64Array {
      requireAllFinite('uc', uc, nc, 'contact displacements');
      return sys.recover(uc);
    },
    recoverAt: (ucs: Float64Array[], at: Int32Array) => sys.recoverAt(ucs, at),
    stresses(u: Float64Array): StressSample[] {
      requireAllFinite('u', u, dofs, 'displacements');
      return centroidStresses(mesh, key.model, 1, key.poisson, u);
    },
    nodeR: mesh.nodeR,
    nodeZ: mesh.nodeZ,
    quads: mesh.quads,
    surfaceNodes: mesh.surface,
    contactNodes,
    forceFactor: key.model === 'axisymmetric' ? 1 : 2,
    // Factor and mesh, K and its compliance, and a stress influence of 4 values per zone element
    // and force node (about one value per DOF and contact node on a graded mesh).
    bytes: 8 * (sys.profile + 3 * dofs + 2 * nc * nc + dofs * nc) + 16 * mesh.quads.length,
  };
}

/** The surface nodes from the pole out to r = CONTACT_REACH (1e-9 absorbs round-off of a node on it). */
function candidateContactNodes(mesh: QuarterSectionMesh): Int32Array {
  const { surface, nodeR } = mesh;
  let nc = 0;
  while (nc < surface.length && nodeR[surface[nc]] <= CONTACT_REACH + 1e-9) nc++;
  return surface.slice(0, nc);
}

/** ½(A + Aᵀ) of a dense row-major n × n array, as a Matrix (removes round-off asymmetry). */
function symmetricPart(a: Float64Array, n: number): Matrix {
  const m = new Matrix(n, n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) m.set(i, j, 0.5 * (a[i * n + j] + a[j * n + i]));
  }
  return m;
}

function requireAllFinite(field: string, v: Float64Array, length: number, what: string): void {
  if (v.length !== length) throw new FemInputError(field, `${field} must hold ${length} ${what}`);
  for (let i = 0; i < v.length; i++) {
    if (!Number.isFinite(v[i])) throw new FemInputError(field, `${field} must hold finite numbers`);
  }
}
