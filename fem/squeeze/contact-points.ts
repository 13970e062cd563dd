import type { FemBody } from '../body/cache';
import { padLift, padReach, type PadGeometry } from './pad';

/**
 * The points where the pad can touch: the candidate contact nodes, plus the pad's outer edge
 * where it falls between two nodes. The edge point moves with the surface segment it lies on,
 * u = w·u[a] + (1 − w)·u[b] (linear element edge), and its force goes to the two nodes in the
 * same proportions, so the pad radius is a continuous input even though nodes are not on it.
 */
export interface ContactPoints {
  /** radius of each point, m, rising from the pole */
  r: Float64Array;
  /** undeformed axial gap between point and pad, m; Infinity beyond the pad */
  gap: Float64Array;
  /** contact-node indices and weight of node `a`: u_point = w·u[a] + (1 − w)·u[b] */
  a: Int32Array;
  b: Int32Array;
  w: Float64Array;
  /** index of the interpolated edge point, or −1 when every point is a node */
  edge: number;
}

/** Contact points of `body` scaled to equatorial radius R (m) under `pad`. */
export function contactPoints(body: FemBody, pad: PadGeometry, R: number): ContactPoints {
  const nodeR = body.contactR;
  const nodeZ = body.contactZ;
  const n = nodeR.length;
  const reach = padReach(pad) / R;
  const drop = (z: number) => (nodeZ[0] - z) * R;
  const j = nodeR.findIndex((x) => x >= reach * (1 - 1e-9));
  const split = j > 0 && nodeR[j] > reach * (1 + 1e-9);
  const size = split ? n + 1 : n;
  const pts = {
    r: new Float64Array(size),
    gap: new Float64Array(size),
    a: new Int32Array(size),
    b: new Int32Array(size),
    w: new Float64Array(size).fill(1),
    edge: split ? j : -1,
  };
  for (let p = 0; p < size; p++) {
    const i = split && p > j ? p - 1 : p;
    pts.a[p] = pts.b[p] = i;
    pts.r[p] = nodeR[i] * R;
    // A node on the edge (within round-off) takes the edge's lift, r_e, not Infinity.
    const onEdge = j >= 0 && i === j && !split;
    pts.gap[p] = drop(nodeZ[i]) + (onEdge ? (pad.edgeRadius ?? 0) : padLift(pad, pts.r[p]));
  }
  if (split) {
    const w = (nodeR[j] - reach) / (nodeR[j] - nodeR[j - 1]);
    pts.a[j] = j - 1;
    pts.b[j] = j;
    pts.w[j] = w;
    pts.r[j] = reach * R;
    pts.gap[j] = drop(w * nodeZ[j - 1] + (1 - w) * nodeZ[j]) + (pad.edgeRadius ?? 0);
  }
  return pts;
}

/** Point values from node values: v_p = w·v[a] + (1 − w)·v[b]. */
export function nodesToPoints(pts: ContactPoints, v: Float64Array): Float64Array {
  return pts.r.map((_, p) => pts.w[p] * v[pts.a[p]] + (1 - pts.w[p]) * v[pts.b[p]]);
}

/** Node loads from point loads (the transpose of nodesToPoints), `nodes` long. */
export function pointsToNodes(pts: ContactPoints, f: Float64Array, nodes: number): Float64Array {
  const out = new Float64Array(nodes);
  f.forEach((x, p) => {
    out[pts.a[p]] += pts.w[p] * x;
    out[pts.b[p]] += (1 - pts.w[p]) * x;
  });
  return out;
}

/** The compliance of the points, T C Tᵀ, from the nodes' (dense row-major, n × n). */
export function pointCompliance(pts: ContactPoints, c: Float64Array, n: number): Float64Array {
  const m = pts.r.length;
  const out = new Float64Array(m * m);
  const { a, b, w } = pts;
  for (let p = 0; p < m; p++) {
    for (let q = 0; q <= p; q++) {
      const v =
        w[p] * (w[q] * c[a[p] * n + a[q]] + (1 - w[q]) * c[a[p] * n + b[q]]) +
        (1 - w[p]) * (w[q] * c[b[p] * n + a[q]] + (1 - w[q]) * c[b[p] * n + b[q]]);
      out[p * m + q] = v;
      out[q * m + p] = v;
    }
  }
  return out;
}
