import type { FemBody } from '../body/cache';
import { elasticSplit, type ElasticSplit } from '../elements/elastic-d';
import { Q4Workspace } from '../elements/q4-stiffness';
import { q4CentroidStressMatrix } from '../elements/q4-stress';
import { elementCorners } from '../mesh/quad-mesh';
import type { ContactSystem } from '../solver/compliance';
import { shearZoneOf } from '../body/grading';

/**
 * Stress influence of the pad forces on the element centroids under the contact zone of a unit
 * body (E = 1 Pa, R = 1 m). Stress is linear in the contact forces p̃ (unit-body N, compressive
 * positive; the contact displacements are u = −C p̃ and recover() has no other loads), so
 * σ(sample) = Σ_j S_j p̃_j. Built once per body: one recover() per contact node that can carry
 * force (r ≤ the zone radius), and each zone element's 4×8 centroid stress matrix from q4Stress
 * with unit element displacements — the same centroid stresses as body.stresses(), far fewer
 * evaluations. The zone holds the elements whose centroid lies within the zone radius of the
 * axis and below the surface (see shearZoneOf); shear outside it is not sampled.
 */
export interface ShearField {
  /** sample radius and depth below the undeformed surface, unit body, sorted by radius */
  r: Float64Array;
  depth: Float64Array;
  /** [sample][component srr, szz, stt, srz][force node], row-major */
  influence: Float64Array;
  /** contact nodes that may carry force (the first `nodes` of the body's contact nodes) */
  nodes: number;
  /** radius and depth of the sampled zone, unit body */
  zone: number;
}

const cache = new WeakMap<FemBody, ShearField>();

/**
 * Depth of the sampled zone over its radius. The zone radius is at least about 1.15× a contact
 * it serves (shearZoneOf), and the largest shear lies within about 0.6 a of the surface: on the
 * axis under a Hertz contact (0.48 a for ν = 0.3, Johnson 1985 §3.4 [from memory]) and nearer
 * the surface at a pad's edge.
 */
const ZONE_DEPTH = 0.8;

/**
 * The cached stress influence of `body` (built on first use) from its contact-node compliance
 * `contact` (createContactSystem(body.K)); it now acts on forces, not displacements.
 */
export function getShearField(body: FemBody, contact: ContactSystem): ShearField {
  const hit = cache.get(body);
  if (hit) return hit;
  const nc = body.contactR.length;
  const zoneRadius = shearZoneOf(body.key);
  let nf = 0;
  while (nf < nc && body.contactR[nf] <= zoneRadius) nf++;
  const zone = elementsUnder(body, zoneRadius);
  // The zone elements' DOFs, packed; one displacement field over them per unit pad force on a
  // contact node (u_c = −C e_j).
  const pack = new Int32Array(body.dofs).fill(-1);
  const dofs: number[] = [];
  for (const { e } of zone) {
    for (let a = 0; a < 4; a++) {
      const v = body.quads[4 * e + a];
      for (const d of [2 * v, 2 * v + 1]) if (pack[d] < 0) pack[d] = dofs.push(d) - 1;
    }
  }
  const columns = body.recoverAt(
    Array.from({ length: nf }, (_, j) =>
      Float64Array.from({ length: nc }, (_, i) => -contact.flat[i * nc + j]),
    ),
    Int32Array.from(dofs),
  );
  const r = new Float64Array(zone.length);
  const depth = new Float64Array(zone.length);
  const influence = new Float64Array(zone.length * 4 * nf);
  const unit = new UnitStresses(body);
  zone.forEach(({ e, r: rc, depth: dc }, s) => {
    unit.evaluate(e);
    r[s] = rc;
    depth[s] = dc;
    for (let j = 0; j < nf; j++) {
      for (let k = 0; k < 4; k++)
        influence[(s * 4 + k) * nf + j] = unit.apply(e, k, columns[j], pack);
    }
  });
  const field = { r, depth, influence, nodes: nf, zone: zoneRadius };
  cache.set(body, field);
  return field;
}

/**
 * Elements whose centroid lies at r ≤ `reach` and less than ZONE_DEPTH·`reach` below the
 * undeformed elliptical meridian z = aspect·√(1 − r²) (unit body), sorted by centroid radius.
 */
function elementsUnder(body: FemBody, reach: number): { e: number; r: number; depth: number }[] {
  const xr = new Float64Array(4);
  const xz = new Float64Array(4);
  const zone: { e: number; r: number; depth: number }[] = [];
  for (let e = 0; e < body.quads.length / 4; e++) {
    elementCorners(body, e, xr, xz);
    let r = 0;
    let z = 0;
    for (let a = 0; a < 4; a++) {
      r += xr[a] / 4;
      z += xz[a] / 4;
    }
    const depth = Math.max(body.key.aspect * Math.sqrt(Math.max(1 - r * r, 0)) - z, 0);
    if (r <= reach && depth <= ZONE_DEPTH * reach) zone.push({ e, r, depth });
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
  private readonly se = new Float64Array(32);
  private readonly ws = new Q4Workspace();
  private readonly material: ElasticSplit;

  constructor(private readonly body: FemBody) {
    this.material = elasticSplit(body.key.model, 1, body.key.poisson);
  }

  /** Fills the matrix for element `e`. */
  evaluate(e: number): void {
    elementCorners(this.body, e, this.xr, this.xz);
    q4CentroidStressMatrix(this.xr, this.xz, this.material, this.se, this.ws);
  }

  /** Stress component `k` of the last evaluated element `e`; `u` holds the DOFs packed by `pack`. */
  apply(e: number, k: number, u: Float64Array, pack: Int32Array): number {
    const { se } = this;
    const quads = this.body.quads;
    let v = 0;
    for (let a = 0; a < 4; a++) {
      const node = quads[4 * e + a];
      v += se[k * 8 + 2 * a] * u[pack[2 * node]] + se[k * 8 + 2 * a + 1] * u[pack[2 * node + 1]];
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

/** The largest shear under a contact, or null with the reason it could not be sampled. */
export interface ShearUnder {
  peak: ShearPeak | null;
  reason: string | null;
}

/**
 * Largest Tresca shear (σ_max − σ_min)/2 over the samples with r ≤ `radius` (the contact radius,
 * unit body), the hoop (or out-of-plane) stress being the third principal stress; `force` holds
 * the contact-node forces of the unit body (real force / (stiffness scale · R), compressive
 * positive; this edition takes forces where the first took displacements). No peak, with the
 * reason, when the contact reaches past the sampled zone or covers no sample.
 */
export function maxShearUnder(field: ShearField, force: Float64Array, radius: number): ShearUnder {
  const nf = field.nodes;
  const beyond = force.some((f, j) => j >= nf && f !== 0);
  if (beyond || radius > field.zone) {
    return { peak: null, reason: 'the contact reaches past the zone where stresses are sampled' };
  }
  if (!(field.r.length > 0 && field.r[0] <= radius)) {
    return { peak: null, reason: 'no stress sample lies under the contact' };
  }
  let count = 0;
  const all = new Int32Array(nf);
  for (let j = 0; j < nf; j++) if (force[j] !== 0) all[count++] = j;
  const loaded = all.subarray(0, count);
  // A sample lies under the contact (checked above), so the search over all depths finds one.
  const peak =
    peakUnder(field, force, loaded, radius, PEAK_DEPTH * radius) ??
    peakUnder(field, force, loaded, radius, Infinity)!;
  return { peak, reason: null };
}

/**
 * Depth, over the contact radius, of the samples searched first. The largest shear lies within
 * about 0.6 a of the surface (see ZONE_DEPTH). Over 672 squeezes (14 024 states: pads from 4 mm
 * to plates, ν 0.3–0.49, rigid and soft facings, aspect 0.7–1.3) the deepest peak was 0.73 a
 * when this was written, and searching to 1 a or to the whole zone gave identical results; the
 * deeper samples, most of the zone under a small contact, are searched only when none lies this
 * shallow (a contact narrower than the elements under it).
 */
const PEAK_DEPTH = 1;

/** The peak over the samples with r ≤ `radius` and depth ≤ `maxDepth`; null if none is there. */
function peakUnder(
  field: ShearField,
  force: Float64Array,
  loaded: Int32Array,
  radius: number,
  maxDepth: number,
): ShearPeak | null {
  const nf = field.nodes;
  const inf = field.influence;
  let best: ShearPeak | null = null;
  for (let s = 0; s < field.r.length && field.r[s] <= radius; s++) {
    if (field.depth[s] > maxDepth) continue;
    const b = s * 4 * nf;
    let srr = 0;
    let szz = 0;
    let stt = 0;
    let srz = 0;
    for (let k = 0; k < loaded.length; k++) {
      const j = loaded[k];
      const fj = force[j];
      srr += inf[b + j] * fj;
      szz += inf[b + nf + j] * fj;
      stt += inf[b + 2 * nf + j] * fj;
      srz += inf[b + 3 * nf + j] * fj;
    }
    const centre = (srr + szz) / 2;
    const radiusMohr = Math.hypot((srr - szz) / 2, srz);
    const top = Math.max(centre + radiusMohr, stt);
    const bottom = Math.min(centre - radiusMohr, stt);
    const shear = (top - bottom) / 2;
    if (best === null) best = { shear: 0, depth: 0, r: 0 };
    if (shear > best.shear) Object.assign(best, { shear, depth: field.depth[s], r: field.r[s] });
  }
  return best;
}
