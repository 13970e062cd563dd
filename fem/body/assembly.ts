import { elasticSplit } from '../elements/elastic-d';
import { Q4Workspace, q4Stiffness } from '../elements/q4-stiffness';
import { elementCorners, type QuadMesh } from '../mesh/quad-mesh';
import type { CsrMatrix } from '../solver/csr';
import type { BodyModel } from '../types';
import { nodeAdjacency, type NodeAdjacency } from './adjacency';

/**
 * Global stiffness K (N/m) of a quad mesh, DOF layout [u_r0, u_z0, u_r1, u_z1, …], as a CSR
 * matrix with its full symmetric pattern (2×2 blocks for every pair of nodes sharing an element).
 * Axisymmetric forces are whole-ring totals (2π included); plane strain is per metre of thickness.
 * Elements are mean-dilatation quads (see q4Stiffness), free of volumetric locking for ν < 0.5.
 * No constraints are applied here.
 */
export function assembleStiffness(
  mesh: QuadMesh,
  model: BodyModel,
  modulus: number,
  poisson: number,
): CsrMatrix {
  const adj = nodeAdjacency(mesh.nodeR.length, mesh.quads);
  const k = blockPattern(adj);
  const material = elasticSplit(model, modulus, poisson);
  const ke = new Float64Array(64);
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  const ws = new Q4Workspace();
  for (let e = 0; e < mesh.quads.length / 4; e++) {
    elementCorners(mesh, e, xr, xz);
    q4Stiffness(xr, xz, material, ke, ws);
    addElement(k, adj, mesh.quads.subarray(4 * e, 4 * e + 4), ke);
  }
  return k;
}

/** The zero-valued CSR matrix with a 2×2 block for every pair of adjacent nodes, columns sorted. */
function blockPattern(adj: NodeAdjacency): CsrMatrix {
  const nNodes = adj.ptr.length - 1;
  const n = 2 * nNodes;
  const rowPtr = new Int32Array(n + 1);
  for (let v = 0; v < nNodes; v++) {
    const len = 2 * (adj.ptr[v + 1] - adj.ptr[v]);
    rowPtr[2 * v + 1] = rowPtr[2 * v] + len;
    rowPtr[2 * v + 2] = rowPtr[2 * v + 1] + len;
  }
  const colIdx = new Int32Array(rowPtr[n]);
  for (let v = 0; v < nNodes; v++) {
    for (let q = adj.ptr[v]; q < adj.ptr[v + 1]; q++) {
      const o = 2 * (q - adj.ptr[v]);
      for (let a = 0; a < 2; a++) {
        colIdx[rowPtr[2 * v + a] + o] = 2 * adj.nodes[q];
        colIdx[rowPtr[2 * v + a] + o + 1] = 2 * adj.nodes[q] + 1;
      }
    }
  }
  return { n, rowPtr, colIdx, values: new Float64Array(rowPtr[n]) };
}

/** Adds the 8×8 element stiffness `ke` of the element with nodes `nodes` into `k`. */
function addElement(k: CsrMatrix, adj: NodeAdjacency, nodes: Int32Array, ke: Float64Array): void {
  for (let a = 0; a < 4; a++) {
    const va = nodes[a];
    for (let b = 0; b < 4; b++) {
      const vb = nodes[b];
      let q = adj.ptr[va];
      while (adj.nodes[q] !== vb) q++;
      const o = 2 * (q - adj.ptr[va]);
      for (let i = 0; i < 2; i++) {
        const base = k.rowPtr[2 * va + i] + o;
        k.values[base] += ke[(2 * a + i) * 8 + 2 * b];
        k.values[base + 1] += ke[(2 * a + i) * 8 + 2 * b + 1];
      }
    }
  }
}
