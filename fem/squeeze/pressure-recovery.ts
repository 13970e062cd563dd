import type { BodyModel } from '../types';

/** Tributary areas A_i (m², or m² per m) and the tridiagonal surface "mass" matrix of the nodes. */
export interface SurfaceWeights {
  area: Float64Array;
  /** M_ii */
  diag: Float64Array;
  /** M_i,i+1 = M_i+1,i */
  off: Float64Array;
}

/**
 * Surface weights of the contact nodes, piecewise linear in r between consecutive nodes and
 * projected on the pad plane: axisymmetric rings 2π r dr (m²), plane strain strips dr (m² per m).
 * Returns the tributary areas A_i = ∫N_i w dr and the tridiagonal of M_ij = ∫N_i N_j w dr.
 */
export function surfaceWeights(r: Float64Array, model: BodyModel): SurfaceWeights {
  const n = r.length;
  const area = new Float64Array(n);
  const diag = new Float64Array(n);
  const off = new Float64Array(Math.max(n - 1, 0));
  const ring = model === 'axisymmetric';
  for (let e = 0; e + 1 < n; e++) {
    const [a, b] = [r[e], r[e + 1]];
    const h = b - a;
    // ∫N_i N_j r dr over a linear segment [a, b] (exact): h(3a+b)/12, h(a+b)/12, h(a+3b)/12.
    const m11 = ring ? (2 * Math.PI * h * (3 * a + b)) / 12 : h / 3;
    const m12 = ring ? (2 * Math.PI * h * (a + b)) / 12 : h / 6;
    const m22 = ring ? (2 * Math.PI * h * (a + 3 * b)) / 12 : h / 3;
    diag[e] += m11;
    diag[e + 1] += m22;
    off[e] = m12;
    area[e] += m11 + m12;
    area[e + 1] += m12 + m22;
  }
  return { area, diag, off };
}

/**
 * Contact pressures (Pa, compressive positive) at the contact points from their forces p_i
 * (N, ≥ 0), as the piecewise-linear field in r whose loads on the points' hat functions are the
 * forces (a Galerkin projection, M p = f with the ring-weighted surface "mass" matrix). The
 * field ends at the first point out of contact, where it is zero, or, when that point lies
 * beyond the pad (`gap` Infinity), at the last point in contact. So that the field carries the
 * whole force, the hat of that outer zero point is added to the test function of the last
 * point in contact: the test functions then sum to 1 over the contact and ∫p dA = Σ f_i
 * exactly (before negative values are cut off). The axis point's own force is the least
 * accurate of a linear axisymmetric mesh and made the recovered profile dip there, so the
 * pressure at the axis is tied to the even extrapolation p₀ = (r₂²p₁ − r₁²p₂)/(r₂² − r₁²) of its
 * neighbours (p is smooth and even in r there) and the axis row is merged into the next one,
 * which keeps the total force. Points out of contact read zero.
 */
export function recoverPressure(
  r: Float64Array,
  force: Float64Array,
  active: Uint8Array,
  model: BodyModel,
  gap?: Float64Array,
): Float64Array {
  const n = r.length;
  const pressure = new Float64Array(n);
  let last = -1;
  active.forEach((a, i) => a && (last = i));
  if (last < 0) return pressure;
  const m = last + 1; // unknowns 0..m−1; point m (if any and reachable) has zero pressure
  const closes = m < n && (gap === undefined || Number.isFinite(gap[m]));
  const { diag, off } = surfaceWeights(r.subarray(0, closes ? m + 1 : m), model);
  const lower = new Float64Array(m);
  const main = new Float64Array(m);
  const upper = new Float64Array(m);
  const rhs = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    lower[i] = i > 0 ? off[i - 1] : 0;
    main[i] = diag[i];
    upper[i] = i < m - 1 ? off[i] : 0;
    rhs[i] = force[i];
  }
  if (closes) main[m - 1] += off[m - 1];
  const tie = m >= 3 && r[0] === 0;
  if (tie) {
    const [r1, r2] = [r[1] * r[1], r[2] * r[2]];
    const alpha = r2 / (r2 - r1);
    const beta = -r1 / (r2 - r1);
    const axis = main[0] + lower[1]; // column 0 summed over rows 0 and 1
    main[1] = upper[0] + main[1] + axis * alpha;
    upper[1] = upper[1] + axis * beta;
    lower[1] = 0;
    rhs[1] += rhs[0];
    const x = thomas(lower.subarray(1), main.subarray(1), upper.subarray(1), rhs.subarray(1));
    pressure.set(x, 1);
    pressure[0] = alpha * x[0] + beta * x[1];
  } else {
    pressure.set(thomas(lower, main, upper, rhs));
  }
  for (let i = 0; i < n; i++) if (!active[i] || pressure[i] < 0) pressure[i] = 0;
  return pressure;
}

/** Solves a tridiagonal system (Thomas algorithm); lower[0] and upper[last] are ignored. */
function thomas(
  lower: Float64Array,
  main: Float64Array,
  upper: Float64Array,
  rhs: Float64Array,
): Float64Array {
  const m = main.length;
  const c = new Float64Array(m);
  const d = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const denom = main[i] - (i > 0 ? lower[i] * c[i - 1] : 0);
    c[i] = i < m - 1 ? upper[i] / denom : 0;
    d[i] = (rhs[i] - (i > 0 ? lower[i] * d[i - 1] : 0)) / denom;
  }
  const x = new Float64Array(m);
  for (let i = m - 1; i >= 0; i--) x[i] = d[i] - (i < m - 1 ? c[i] * x[i + 1] : 0);
  return x;
}
