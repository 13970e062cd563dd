import type { FemBody } from '../body/cache';
import { elasticD, lameLambda } from '../elements/elastic-d';
import { q4Stress } from '../elements/q4-stress';

/**
 * Stress influence of the contact nodes on the element centroids under the candidate contact
 * zone of a unit body (E = 1 Pa, R = 1 m). Stress is linear in the contact displacements
 * (recover() has no other loads), so σ(sample) = Σ_j S_j u_j. Built once per body: one recover()
 * per contact node, and each zone element's 4×8 centroid stress matrix from q4Stress with unit
 * element displacements — the same centroid stresses as body.stresses(), far fewer evaluations.
 */
export interface ShearField {
  /** sample radius and depth below the undeformed surface, unit body, sorted by radius */
  r: Float64Array;
  depth: Float64Array;
  /** [sample][component srr, szz, stt, srz][contact node], row-major */
  influence: Float64Array;
  nodes: number;
}

const cache = new WeakMap<FemBody, ShearField>();

/** The cached stress influence of `body` (built on first use). */
export function getShearField(body: FemBody): ShearField {
  const hit = cache.get(body);
  if (hit) return hit;
  const nc = body.contactR.length;
  const reach = body.contactR[nc - 1];
  const { nodeR, nodeZ, quads, key } = body;
  const axi = key.model === 'axisymmetric';
  const d = elasticD(key.model, 1, key.poisson);
  const lambda = lameLambda(1, key.poisson);
  const columns = Array.from({ length: nc }, (_, j) => {
    const uc = new Float64Array(nc);
    uc[j] = 1;
    return body.recover(uc);
  });
  const zone: { e: number; r: number; z: number }[] = [];
  for (let e = 0; e < quads.length / 4; e++) {
    let r = 0;
    let z = 0;
    for (let a = 0; a < 4; a++) {
      r += nodeR[quads[4 * e + a]] / 4;
      z += nodeZ[quads[4 * e + a]] / 4;
    }
    if (r <= reach) zone.push({ e, r, z });
  }
  zone.sort((x, y) => x.r - y.r);
  const ns = zone.length;
  const r = new Float64Array(ns);
  const depth = new Float64Array(ns);
  const influence = new Float64Array(ns * 4 * nc);
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  const ue = new Float64Array(8);
  const se = new Float64Array(32); // [component][local dof]
  zone.forEach(({ e, r: rc }, s) => {
    for (let a = 0; a < 4; a++) {
      xr[a] = nodeR[quads[4 * e + a]];
      xz[a] = nodeZ[quads[4 * e + a]];
    }
    for (let c = 0; c < 8; c++) {
      ue.fill(0);
      ue[c] = 1;
      const q = q4Stress(xr, xz, ue, d, axi, lambda, 0, 0);
      if (c === 0) {
        r[s] = q.r;
        // Depth below the undeformed elliptical meridian z = aspect·√(1 − r²) of the unit body.
        depth[s] = Math.max(key.aspect * Math.sqrt(Math.max(1 - rc * rc, 0)) - q.z, 0);
      }
      [q.srr, q.szz, q.stt, q.srz].forEach((v, k) => (se[k * 8 + c] = v));
    }
    for (let j = 0; j < nc; j++) {
      const u = columns[j];
      for (let k = 0; k < 4; k++) {
        let v = 0;
        for (let a = 0; a < 4; a++) {
          const node = quads[4 * e + a];
          v += se[k * 8 + 2 * a] * u[2 * node] + se[k * 8 + 2 * a + 1] * u[2 * node + 1];
        }
        influence[(s * 4 + k) * nc + j] = v;
      }
    }
  });
  const field = { r, depth, influence, nodes: nc };
  cache.set(body, field);
  return field;
}

/** Largest Tresca shear and where it sits, unit-body units (multiply stress by E, lengths by R). */
export interface ShearPeak {
  shear: number;
  depth: number;
  r: number;
}

/**
 * Largest Tresca shear (σ_max − σ_min)/2 over the samples with r ≤ `radius`, the hoop (or
 * out-of-plane) stress being the third principal stress; `u` are the unit body's contact-node
 * axial displacements (real displacement / R).
 */
export function maxShearUnder(field: ShearField, u: Float64Array, radius: number): ShearPeak {
  const nc = field.nodes;
  const best: ShearPeak = { shear: 0, depth: 0, r: 0 };
  const inf = field.influence;
  for (let s = 0; s < field.r.length && field.r[s] <= radius; s++) {
    const b = s * 4 * nc;
    let srr = 0;
    let szz = 0;
    let stt = 0;
    let srz = 0;
    for (let j = 0; j < nc; j++) {
      const uj = u[j];
      srr += inf[b + j] * uj;
      szz += inf[b + nc + j] * uj;
      stt += inf[b + 2 * nc + j] * uj;
      srz += inf[b + 3 * nc + j] * uj;
    }
    const centre = (srr + szz) / 2;
    const radiusMohr = Math.hypot((srr - szz) / 2, srz);
    const top = Math.max(centre + radiusMohr, stt);
    const bottom = Math.min(centre - radiusMohr, stt);
    const shear = (top - bottom) / 2;
    if (shear > best.shear) Object.assign(best, { shear, depth: field.depth[s], r: field.r[s] });
  }
  return best;
}
