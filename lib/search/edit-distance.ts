/**
 * Edit distance with adjacent transpositions (optimal string alignment): insertions, deletions,
 * substitutions and swaps of two neighbouring letters each cost one — the four kinds of typing
 * error Damerau counted ("A technique for computer detection and correction of spelling errors",
 * Communications of the ACM 7(3), 1964), by the dynamic programme of Wagner and Fischer ("The
 * string-to-string correction problem", Journal of the ACM 21(1), 1974).
 *
 * Returns the distances from `a` to every beginning of `b` (entry j: `a` against the first j
 * letters of `b`), or null as soon as every alignment costs more than `max`, so a scan of the
 * whole vocabulary stays cheap. The rows live in buffers reused between calls: read the answer
 * before the next call.
 */
let rows: Int32Array[] = [];

export function prefixDistances(a: string, b: string, max: number): Int32Array | null {
  const n = b.length;
  if (!rows.length || rows[0].length < n + 1) {
    rows = [0, 1, 2].map(() => new Int32Array(Math.max(64, 2 * (n + 1))));
  }
  let [before, previous, current] = rows;
  for (let j = 0; j <= n; j++) previous[j] = j;
  for (let i = 1; i <= a.length; i++) {
    current[0] = i;
    let rowMin = i;
    const ai = a.charCodeAt(i - 1);
    for (let j = 1; j <= n; j++) {
      const bj = b.charCodeAt(j - 1);
      let d = previous[j - 1] + (ai === bj ? 0 : 1);
      if (previous[j] + 1 < d) d = previous[j] + 1;
      if (current[j - 1] + 1 < d) d = current[j - 1] + 1;
      if (
        i > 1 &&
        j > 1 &&
        ai === b.charCodeAt(j - 2) &&
        a.charCodeAt(i - 2) === bj &&
        before[j - 2] + 1 < d
      ) {
        d = before[j - 2] + 1;
      }
      current[j] = d;
      if (d < rowMin) rowMin = d;
    }
    if (rowMin > max) return null;
    [before, previous, current] = [previous, current, before];
  }
  return previous.subarray(0, n + 1);
}

/** The distance between `a` and `b`, or `max + 1` when it is over `max`. */
export function editDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  const d = prefixDistances(a, b, max);
  return d ? Math.min(d[b.length], max + 1) : max + 1;
}
