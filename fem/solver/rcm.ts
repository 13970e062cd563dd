import type { CsrMatrix } from './csr';

/**
 * Reverse Cuthill–McKee ordering of the vertices with include[v] = 1 in the graph of a symmetric
 * sparsity pattern; returns those vertices in elimination order (new → old index). The
 * breadth-first search starts from `seeds` (which need not be included themselves: seeding with
 * the DOFs that are kept after condensation puts their neighbours last, so the kept rows of a
 * profile matrix placed after them stay short), else from a pseudo-peripheral vertex.
 */
export function reverseCuthillMcKee(
  g: Pick<CsrMatrix, 'n' | 'rowPtr' | 'colIdx'>,
  include: Uint8Array,
  seeds: ArrayLike<number> = [],
): Int32Array {
  const { n, rowPtr, colIdx } = g;
  const degree = new Int32Array(n);
  let count = 0;
  for (let v = 0; v < n; v++) {
    if (!include[v]) continue;
    count++;
    for (let p = rowPtr[v]; p < rowPtr[v + 1]; p++) if (include[colIdx[p]]) degree[v]++;
  }
  const visited = new Uint8Array(n);
  const queue = new Int32Array(n + seeds.length);
  const order = new Int32Array(count);
  let placed = 0;
  let head = 0;
  let tail = 0;
  const visitNeighbours = (v: number): void => {
    const start = tail;
    for (let p = rowPtr[v]; p < rowPtr[v + 1]; p++) {
      const w = colIdx[p];
      if (include[w] && !visited[w]) {
        visited[w] = 1;
        queue[tail++] = w;
      }
    }
    queue.subarray(start, tail).sort((x, y) => degree[x] - degree[y]);
  };
  for (let s = 0; s < seeds.length; s++) {
    const v = seeds[s];
    if (!visited[v]) {
      visited[v] = 1;
      queue[tail++] = v;
    }
  }
  while (placed < count) {
    if (head === tail) {
      const root = pseudoPeripheral(g, include, visited, degree);
      visited[root] = 1;
      queue[tail++] = root;
    }
    const v = queue[head++];
    if (include[v]) order[placed++] = v;
    visitNeighbours(v);
  }
  return order.reverse();
}

/** George–Liu style root: repeat BFS from the far end of the last level until its depth stops growing. */
function pseudoPeripheral(
  g: Pick<CsrMatrix, 'n' | 'rowPtr' | 'colIdx'>,
  include: Uint8Array,
  taken: Uint8Array,
  degree: Int32Array,
): number {
  let root = -1;
  for (let v = 0; v < g.n; v++) {
    if (include[v] && !taken[v] && (root < 0 || degree[v] < degree[root])) root = v;
  }
  const level = new Int32Array(g.n);
  let depth = -1;
  for (let pass = 0; pass < 5; pass++) {
    level.fill(-1);
    level[root] = 0;
    const q = [root];
    for (let h = 0; h < q.length; h++) {
      const v = q[h];
      for (let p = g.rowPtr[v]; p < g.rowPtr[v + 1]; p++) {
        const w = g.colIdx[p];
        if (include[w] && !taken[w] && level[w] < 0) {
          level[w] = level[v] + 1;
          q.push(w);
        }
      }
    }
    const last = level[q[q.length - 1]];
    if (last <= depth) break;
    depth = last;
    let best = q[q.length - 1];
    for (const v of q) if (level[v] === last && degree[v] < degree[best]) best = v;
    root = best;
  }
  return root;
}
