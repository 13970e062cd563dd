import { elasticD } from '../elements/elastic-d';
import { Q4Workspace, q4Stiffness } from '../elements/q4-stiffness';
import type { QuadMesh } from '../mesh/quad-mesh';
import type { CsrMatrix } from '../solver/csr';
import type { BodyModel } from '../types';

/**
 * Global stiffness K (N/m) of a quad mesh, DOF layout [u_r0, u_z0, u_r1, u_z1, …], as a CSR
 * matrix with its full symmetric pattern (2×2 blocks for every pair of nodes sharing an element).
 * Axisymmetric forces are whole-ring totals (2π included); plane strain is per metre of thickness.
 * No constraints are applied here.
 */
export function assembleStiffness(
  mesh: QuadMesh,
  model: BodyModel,
  modulus: number,
  poisson: number,
): CsrMatrix {
  const { nodeR, nodeZ, quads } = mesh;
  const nNodes = nodeR.length;
  const nElem = quads.length / 4;
  const adj = nodeAdjacency(nNodes, quads);
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
  const values = new Float64Array(rowPtr[n]);
  const d = elasticD(model, modulus, poisson);
  const axi = model === 'axisymmetric';
  const ke = new Float64Array(64);
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  const ws = new Q4Workspace();
  for (let e = 0; e < nElem; e++) {
    for (let a = 0; a < 4; a++) {
      xr[a] = nodeR[quads[4 * e + a]];
      xz[a] = nodeZ[quads[4 * e + a]];
    }
    q4Stiffness(xr, xz, d, axi, ke, ws);
    for (let a = 0; a < 4; a++) {
      const va = quads[4 * e + a];
      for (let b = 0; b < 4; b++) {
        const vb = quads[4 * e + b];
        let q = adj.ptr[va];
        while (adj.nodes[q] !== vb) q++;
        const o = 2 * (q - adj.ptr[va]);
        for (let i = 0; i < 2; i++) {
          const base = rowPtr[2 * va + i] + o;
          values[base] += ke[(2 * a + i) * 8 + 2 * b];
          values[base + 1] += ke[(2 * a + i) * 8 + 2 * b + 1];
        }
      }
    }
  }
  return { n, rowPtr, colIdx, values };
}

/** Sorted lists of the nodes sharing an element with each node (itself included). */
function nodeAdjacency(nNodes: number, quads: Int32Array): { ptr: Int32Array; nodes: Int32Array } {
  const nElem = quads.length / 4;
  const elPtr = new Int32Array(nNodes + 1);
  for (let i = 0; i < quads.length; i++) elPtr[quads[i] + 1]++;
  for (let v = 0; v < nNodes; v++) elPtr[v + 1] += elPtr[v];
  const elList = new Int32Array(quads.length);
  const fill = elPtr.slice(0, nNodes);
  for (let e = 0; e < nElem; e++) for (let a = 0; a < 4; a++) elList[fill[quads[4 * e + a]]++] = e;
  const ptr = new Int32Array(nNodes + 1);
  const lists: Int32Array[] = [];
  const mark = new Int32Array(nNodes).fill(-1);
  for (let v = 0; v < nNodes; v++) {
    const found: number[] = [];
    for (let p = elPtr[v]; p < elPtr[v + 1]; p++) {
      for (let a = 0; a < 4; a++) {
        const w = quads[4 * elList[p] + a];
        if (mark[w] !== v) {
          mark[w] = v;
          found.push(w);
        }
      }
    }
    const sorted = Int32Array.from(found).sort();
    lists.push(sorted);
    ptr[v + 1] = ptr[v] + sorted.length;
  }
  const nodes = new Int32Array(ptr[nNodes]);
  for (let v = 0; v < nNodes; v++) nodes.set(lists[v], ptr[v]);
  return { ptr, nodes };
}
