import { requirePositive } from '../validate';
import type { MeshPlan } from './mesh-levels';
import { DiscDrawing } from './disc-drawing';
import type { QuarterSectionMesh } from './quad-mesh';
import { ringRadii } from './ring-radii';
import { gradedPositions } from './spacing';
import { fillPatch } from './transfinite';

/** Core square side and its inner corner distance, as fractions of the core radius. */
const CORE_SIDE = 0.55;
const CORE_CORNER = 0.72;

/**
 * Quarter section r ≥ 0, z ≥ 0 of the ellipse (r/1)² + (z/aspect)² ≤ 1, meshed with quads.
 * Built on the unit quarter disc and stretched by `aspect` in z (an affine map, so element
 * Jacobians stay positive). Around the pole P = (0, 1): a uniform core of three transfinite
 * patches, then rings (circles about P, from the axis to the surface) whose radii grow
 * geometrically, then one transfinite patch for the rest of the body. A plan may hold the pole
 * spacing out to a chord `contactExtent` (the expected contact) and add a refined band of rings
 * (the pad's edge); the core shrinks to end where the band begins.
 */
export function quarterEllipseMesh(aspect: number, p: MeshPlan): QuarterSectionMesh {
  requirePositive('aspect', aspect);
  const g = new DiscDrawing(p.half);
  const band = p.band ?? null;
  let rhoMin = (p.poleSpacing * p.half) / CORE_SIDE;
  if (band && band.lo < rhoMin) rhoMin = Math.max(band.lo, (band.spacing * p.half) / CORE_SIDE);
  const core = poleCore(g, rhoMin);
  const radii = ringRadii(
    {
      natural: g.psiMax(rhoMin) / (2 * p.half),
      contactSpacing: p.poleSpacing,
      contactExtent: p.contactExtent ?? 0,
      band,
    },
    rhoMin,
    p.ringOuter,
  );
  const rings = growingRings(g, core.ring, radii);
  const rest = outerPatch(g, rings.outer, rings.growth, p.ringOuter);
  const mesh = g.mb.build();
  for (let i = 0; i < mesh.nodeZ.length; i++) mesh.nodeZ[i] *= aspect;
  return {
    ...mesh,
    aspect,
    surface: Int32Array.from([...core.surface, ...rings.surface, ...rest.surface]),
    axis: Int32Array.from([...core.axis, ...rings.axis, ...rest.axis]),
    midplane: Int32Array.from(rest.midplane),
  };
}

/** Boundary nodes a part of the mesh adds, listed outward from the pole. */
interface Part {
  axis: number[];
  surface: number[];
}

/** The uniform core around the pole (three patches) up to the first ring, radius ρ_min. */
function poleCore(g: DiscDrawing, rhoMin: number): Part & { ring: number[] } {
  const { m, mb } = g;
  const k = Math.max(1, Math.round(0.6 * m));
  const s = CORE_SIDE * rhoMin;
  const pole = mb.node(0, 1);
  const aS = mb.node(0, 1 - s);
  const sS = g.surf(g.alphaOf(s));
  const surf1 = g.arc(pole, sS, 0, g.alphaOf(s), m);
  const rhoC = CORE_CORNER * rhoMin;
  const c = g.polar(rhoC, g.psiMax(rhoC) / 2);
  const axis1 = g.line(pole, aS, m);
  const edgeAC = g.line(aS, c, m);
  const edgeSC = g.line(sS, c, m);
  fillPatch(mb, axis1, edgeSC, surf1, edgeAC);
  const ring = g.ring(rhoMin);
  const axis2 = g.line(aS, ring[0], k);
  const surf2 = g.arc(sS, ring[2 * m], g.alphaOf(s), g.alphaOf(rhoMin), k);
  const edgeCR = g.line(c, ring[m], k);
  fillPatch(mb, axis2, edgeCR, edgeAC, ring.slice(0, m + 1));
  fillPatch(mb, surf2, edgeCR, edgeSC, ring.slice(m).reverse());
  return { axis: [...axis1, ...axis2.slice(1)], surface: [...surf1, ...surf2.slice(1)], ring };
}

/** Rings at the given radii (the first is the core's ring); `growth` is the last radius ratio. */
function growingRings(
  g: DiscDrawing,
  first: number[],
  radii: number[],
): Part & { outer: number[]; growth: number } {
  const m = g.m;
  const n = radii.length - 1;
  const growth = radii[n] / radii[n - 1];
  const axis: number[] = [];
  const surface: number[] = [];
  let inner = first;
  for (let k = 1; k <= n; k++) {
    const outer = g.ring(radii[k]);
    for (let j = 0; j < 2 * m; j++) g.mb.quad(inner[j], outer[j], outer[j + 1], inner[j + 1]);
    axis.push(outer[0]);
    surface.push(outer[2 * m]);
    inner = outer;
  }
  return { axis, surface, outer: inner, growth };
}

/** The rest: bottom = midplane, top = outermost ring, left = axis, right = surface. */
function outerPatch(
  g: DiscDrawing,
  inner: number[],
  growth: number,
  ringOuter: number,
): Part & { midplane: number[] } {
  const m = g.m;
  const nB = Math.ceil(0.6 * 2 * m);
  const lastStep = ringOuter * (1 - 1 / growth);
  const origin = g.mb.node(0, 0);
  const equator = g.mb.node(1, 0);
  const alphaOuter = g.alphaOf(ringOuter);
  const sideLen = Math.PI / 2 - alphaOuter;
  const tRight = gradedPositions(nB, (growth * lastStep) / sideLen);
  const right = g.arc(equator, inner[2 * m], Math.PI / 2, alphaOuter, nB, reverseGrading(tRight));
  const tLeft = gradedPositions(nB, (growth * lastStep) / (1 - ringOuter));
  const left = g.line(origin, inner[0], nB, reverseGrading(tLeft));
  const bottom = g.line(origin, equator, 2 * m);
  fillPatch(g.mb, bottom, inner, left, right);
  return {
    axis: left.slice(0, nB).reverse(),
    surface: right.slice(0, nB).reverse(),
    midplane: bottom,
  };
}

/** Positions of the same segments listed from the other end. */
function reverseGrading(t: Float64Array): Float64Array {
  const n = t.length - 1;
  const out = new Float64Array(n + 1);
  for (let i = 0; i <= n; i++) out[i] = 1 - t[n - i];
  return out;
}
