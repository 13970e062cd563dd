import type { FemBody } from '../body/cache';
import { elasticSplit, type ElasticSplit } from '../elements/elastic-d';
import { Q4Workspace } from '../elements/q4-stiffness';
import { q4Stress } from '../elements/q4-stress';
import { elementCorners } from '../mesh/quad-mesh';

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
  // One full unit-body displacement field per contact node moved by 1 (unit body, m).
  const columns = Array.from({ length: nc }, (_, j) => {
    const uc = new Float64Array(nc);
    uc[j] = 1;
    return body.recover(uc);
  });
  const zone = elementsUnder(body, body.contactR[nc - 1]);
  const r = new Float64Array(zone.length);
  const depth = new Float64Array(zone.length);
  const influence = new Float64Array(zone.length * 4 * nc);
  const unit = new UnitStresses(body);
  zone.forEach(({ e, r: rc }, s) => {
    const at = unit.evaluate(e);
    r[s] = at.r;
    // Depth below the undeformed elliptical meridian z = aspect·√(1 − r²) of the unit body.
    depth[s] = Math.max(body.key.aspect * Math.sqrt(Math.max(1 - rc * rc, 0)) - at.z, 0);
    for (let j = 0; j < nc; j++) {
      for (let k = 0; k < 4; k++) influence[(s * 4 + k) * nc + j] = unit.apply(e, k, columns[j]);
    }
  });
  const field = { r, depth, influence, nodes: nc };
  cache.set(body, field);
  return field;
}

/** Elements whose centroid lies at r ≤ `reach` (unit body), sorted by centroid radius. */
function elementsUnder(body: FemBody, reach: number): { e: number; r: number }[] {
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  const zone: { e: number; r: number }[] = [];
  for (let e = 0; e < body.quads.length / 4; e++) {
    elementCorners(body, e, xr, xz);
    let r = 0;
    for (let a = 0; a < 4; a++) r += xr[a] / 4;
    if (r <= reach) zone.push({ e, r });
  }
  return zone.sort((x, y) => x.r - y.r);
}

/**
 * Centroid stresses of one element of the unit body (E = 1 Pa) for each of its 8 DOFs moved by 1,
 * kept as the 4 × 8 matrix `se` [component srr, szz, stt, srz][local DOF].
 */
class UnitStresses {
  private readonly xr = new Float64Array(4);
  private readonly xz = new Float64Array(4);
  private readonly ue = new Float64Array(8);
  private readonly se = new Float64Array(32);
  private readonly ws = new Q4Workspace();
  private readonly material: ElasticSplit;

  constructor(private readonly body: FemBody) {
    this.material = elasticSplit(body.key.model, 1, body.key.poisson);
  }

  /** Fills the matrix for element `e`; returns the centroid (r, z) in m. */
  evaluate(e: number): { r: number; z: number } {
    const { xr, xz, ue, se } = this;
    elementCorners(this.body, e, xr, xz);
    let centroid = { r: 0, z: 0 };
    for (let c = 0; c < 8; c++) {
      ue.fill(0);
      ue[c] = 1;
      const q = q4Stress(xr, xz, ue, this.material, 0, 0, this.ws);
      if (c === 0) centroid = { r: q.r, z: q.z };
      [q.srr, q.szz, q.stt, q.srz].forEach((v, k) => (se[k * 8 + c] = v));
    }
    return centroid;
  }

  /** Stress component `k` of the last evaluated element `e` under the full displacement `u`. */
  apply(e: number, k: number, u: Float64Array): number {
    const { se } = this;
    const quads = this.body.quads;
    let v = 0;
    for (let a = 0; a < 4; a++) {
      const node = quads[4 * e + a];
      v += se[k * 8 + 2 * a] * u[2 * node] + se[k * 8 + 2 * a + 1] * u[2 * node + 1];
    }
    return v;
  }
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
