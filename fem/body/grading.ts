import { FemInputError } from '../errors';
import { LEVEL_GRADING, MESH_LEVEL_PARAMS, type MeshPlan } from '../mesh/mesh-levels';
import type { EdgeBand, MeshLevel } from '../types';

/** Contact-scale bands are 2^(1/4) apart; the mesh is graded to the band's lower end. */
const BANDS_PER_OCTAVE = 4;
/** Smallest contact radius (unit body) a mesh is graded to; smaller contacts get this grading. */
export const CONTACT_SCALE_MIN = 0.002;
/** Largest contact radius (unit body) a mesh is graded to (the travel limit keeps a below it). */
export const CONTACT_SCALE_MAX = 0.4;
/** Pad-edge bands: edges of the refined band sit on multiples of this many band spacings. */
const EDGE_GRID = 8;
/** Margin of the refined band beyond the pad's edges, in band spacings. */
const EDGE_MARGIN = 4;
/** The refined band stops short of the outer patch of the mesh (chord from the pole). */
const BAND_LIMIT = 0.65;
/** The expected contact is resolved uniformly out to this multiple of the band's radius. */
const CONTACT_REACH = 1.5;

/** Chord from the pole of the unit circle's surface point at radius r (r = sin α, chord 2 sin(α/2)). */
export function chordOf(r: number): number {
  return 2 * Math.sin(Math.asin(Math.min(r, 1)) / 2);
}

/** The contact-scale band (an integer) whose lower end is at most `radius` (unit body). */
export function contactBandOf(radius: number): number {
  const a = Math.min(Math.max(radius, CONTACT_SCALE_MIN), CONTACT_SCALE_MAX);
  return Math.floor(BANDS_PER_OCTAVE * Math.log2(a) + 1e-9);
}

/** The contact radius (unit body) a band grades the mesh to. */
export function contactScaleOf(band: number): number {
  return 2 ** (band / BANDS_PER_OCTAVE);
}

/** Pad edge in unit-body radii: flat radius b, outer radius, edge radius; and the largest contact expected. */
export interface EdgeTarget {
  flat: number;
  outer: number;
  edge: number;
  maxContact: number;
}

/**
 * The refined band for a pad edge on a mesh of `level` graded to contact band `contact`, or null
 * when the flat of the pad reaches past the largest contact expected (the pad acts as a plate).
 * Band spacing: at most the edge radius over the level's edge divisions and the surrounding
 * spacing over its band refinement, rounded down to a power of √2; band ends on a grid of 8
 * spacings, so nearby pad sizes share a body.
 */
export function edgeBandOf(
  level: MeshLevel,
  contact: number | null,
  t: EdgeTarget,
): EdgeBand | null {
  if (t.flat > t.maxContact) return null;
  const plan = planOf(level, contact, null);
  const grading = LEVEL_GRADING[level];
  const lo0 = chordOf(t.flat);
  // The spacing the mesh would have there: the pole spacing over the contact (the core and the
  // capped rings), then the smaller of the natural ring spacing and the contact's growth.
  const extent = plan.contactExtent ?? 0;
  const ambient =
    lo0 <= extent
      ? plan.poleSpacing
      : Math.min(
          Math.max((lo0 * Math.PI) / (4 * plan.half), plan.poleSpacing),
          plan.poleSpacing + 0.15 * (lo0 - extent),
        );
  const target = Math.max(
    Math.min(t.edge / grading.edgeDivisions, ambient / grading.bandRefinement),
    plan.poleSpacing / 32,
  );
  const spacing = Math.floor(2 * Math.log2(target));
  const h = 2 ** (spacing / 2);
  const top = Math.min(chordOf(Math.min(t.outer, t.maxContact)) + EDGE_MARGIN * h, BAND_LIMIT);
  const lo = Math.max(0, Math.floor((lo0 - EDGE_MARGIN * h) / (EDGE_GRID * h)));
  const hi = Math.ceil(top / (EDGE_GRID * h));
  return hi > lo ? { spacing, lo, hi } : null;
}

/** The mesh plan of a level, graded to a contact band and refined over a pad-edge band. */
export function planOf(level: MeshLevel, contact: number | null, edge: EdgeBand | null): MeshPlan {
  const base = MESH_LEVEL_PARAMS[level];
  let plan: MeshPlan = { ...base };
  if (contact !== null) {
    const a = contactScaleOf(contact);
    const spacing = Math.min(base.poleSpacing, a / LEVEL_GRADING[level].nodesPerContact);
    plan = { ...plan, poleSpacing: spacing, contactExtent: chordOf(CONTACT_REACH * a) };
  }
  if (edge !== null) {
    const h = 2 ** (edge.spacing / 2);
    plan = {
      ...plan,
      band: { lo: edge.lo * EDGE_GRID * h, hi: edge.hi * EDGE_GRID * h, spacing: h },
    };
  }
  return plan;
}

/** Checks the integer band fields of a body key (FemInputError naming the field). */
export function requireBands(contact: number | undefined, edge: EdgeBand | undefined): void {
  const lowest = Math.floor(BANDS_PER_OCTAVE * Math.log2(CONTACT_SCALE_MIN));
  if (contact !== undefined && !(Number.isInteger(contact) && contact >= lowest && contact <= 0)) {
    throw new FemInputError('contactBand', `contactBand must be an integer from ${lowest} to 0`);
  }
  if (edge === undefined) return;
  const { spacing, lo, hi } = edge;
  if (
    ![spacing, lo, hi].every(Number.isInteger) ||
    spacing > -2 ||
    spacing < -40 ||
    lo < 0 ||
    hi <= lo
  ) {
    throw new FemInputError(
      'edgeBand',
      'edgeBand must hold integers with spacing -40..-2 and 0 ≤ lo < hi',
    );
  }
  if (hi * EDGE_GRID * 2 ** (spacing / 2) > BAND_LIMIT + EDGE_GRID * 2 ** (spacing / 2)) {
    throw new FemInputError('edgeBand', 'edgeBand must end within the contact zone');
  }
}

/**
 * The band value of Poisson's ratio the body is built with: steps of 0.005 up to 0.49, then
 * steps of 0.1 in log₁₀(0.5 − ν) (0.49, 0.492, 0.4937, …, 0.499, …). The squeeze keeps the
 * exact E* = E/(1 − ν²), which fixes the half-space contact, so ν enters only the finite
 * body's small departure from it and the subsurface stresses (see prepareBody).
 */
export function poissonBandOf(poisson: number): number {
  if (poisson <= 0.4875) return Math.round(poisson * 200) / 200;
  const k = Math.max(20, Math.round(-10 * Math.log10(0.5 - poisson)));
  return 0.5 - 10 ** (-k / 10);
}

/**
 * Radius (unit body) of the zone where subsurface stresses are sampled: 1.5× the graded contact
 * radius (the contact at the full travel reaches about 1.3× it: the band's lower end is within
 * 2^(1/4) of the Hertz estimate, and the finite body's contact is a few per cent larger), or
 * the refined edge band when it reaches further, at most the candidate contact zone (0.6); the
 * whole candidate zone for a body without a contact band. A larger contact makes the run
 * regrade its mesh to it (see runCase).
 */
export function shearZoneOf(key: { contactBand?: number; edgeBand?: EdgeBand }): number {
  if (key.contactBand === undefined) return 0.6;
  let zone = 1.5 * contactScaleOf(key.contactBand);
  if (key.edgeBand) {
    const h = 2 ** (key.edgeBand.spacing / 2);
    zone = Math.max(zone, key.edgeBand.hi * EDGE_GRID * h);
  }
  return Math.min(zone, 0.6);
}
