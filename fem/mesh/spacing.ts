/**
 * Normalised positions 0 = t_0 < … < t_n = 1 of n segments whose first segment is about
 * `firstFraction` of the whole and which grow geometrically; uniform if that would need shrinking.
 */
export function gradedPositions(n: number, firstFraction: number): Float64Array {
  const t = new Float64Array(n + 1);
  if (firstFraction * n >= 1) {
    for (let i = 0; i <= n; i++) t[i] = i / n;
    return t;
  }
  // Solve firstFraction · (g^n − 1)/(g − 1) = 1 for the growth ratio g > 1 by bisection.
  let lo = 1;
  let hi = 2;
  const total = (g: number): number => (firstFraction * (Math.pow(g, n) - 1)) / (g - 1);
  while (total(hi) < 1) hi *= 2;
  for (let it = 0; it < 80; it++) {
    const mid = 0.5 * (lo + hi);
    if (total(mid) < 1) lo = mid;
    else hi = mid;
  }
  const g = 0.5 * (lo + hi);
  let size = firstFraction;
  for (let i = 1; i <= n; i++) {
    t[i] = t[i - 1] + size;
    size *= g;
  }
  for (let i = 1; i <= n; i++) t[i] /= t[n];
  return t;
}

/** Normalised cumulative chord length of a polyline given by node coordinates. */
export function chordPositions(r: ArrayLike<number>, z: ArrayLike<number>): Float64Array {
  const n = r.length;
  const t = new Float64Array(n);
  for (let i = 1; i < n; i++) t[i] = t[i - 1] + Math.hypot(r[i] - r[i - 1], z[i] - z[i - 1]);
  for (let i = 1; i < n; i++) t[i] /= t[n - 1];
  return t;
}
