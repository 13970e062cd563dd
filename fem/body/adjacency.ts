/** Node adjacency in CSR form: the neighbours of node v are nodes[ptr[v]..ptr[v + 1]), sorted. */
export interface NodeAdjacency {
  ptr: Int32Array;
  nodes: Int32Array;
}

/** Sorted lists of the nodes sharing an element with each node (itself included). */
export function nodeAdjacency(nNodes: number, quads: Int32Array): NodeAdjacency {
  const elPtr = new Int32Array(nNodes + 1);
  for (let i = 0; i < quads.length; i++) elPtr[quads[i] + 1]++;
  for (let v = 0; v < nNodes; v++) elPtr[v + 1] += elPtr[v];
  const elList = new Int32Array(quads.length);
  const fill = elPtr.slice(0, nNodes);
  for (let e = 0; e < quads.length / 4; e++) {
    for (let a = 0; a < 4; a++) elList[fill[quads[4 * e + a]]++] = e;
  }
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
