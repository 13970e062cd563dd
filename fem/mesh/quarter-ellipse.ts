import { requirePositive } from '../validate';
import type { MeshLevelParams } from './mesh-levels';
import { MeshBuilder, type QuarterSectionMesh } from './quad-mesh';
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
 * geometrically, then one transfinite patch for the rest of the body.
 */
export function quarterEllipseMesh(aspect: number, p: MeshLevelParams): QuarterSectionMesh {
  requirePositive('aspect', aspect);
  const mb = new MeshBuilder();
  const m = p.half;
  const k = Math.max(1, Math.round(0.6 * m));
  const rhoMin = (p.poleSpacing * m) / CORE_SIDE;
  // Polar point about the pole: ψ = 0 points down the axis; ψMax(ρ) is where the ring meets the surface.
  const psiMax = (rho: number): number => Math.PI / 2 - Math.asin(rho / 2);
  const polar = (rho: number, psi: number): number =>
    mb.node(rho * Math.sin(psi), 1 - rho * Math.cos(psi));
  const surf = (alpha: number): number => mb.node(Math.sin(alpha), Math.cos(alpha));
  const alphaOf = (chord: number): number => 2 * Math.asin(chord / 2);
  const line = (a: number, b: number, n: number, t?: Float64Array): number[] => {
    const [ar, az] = mb.coords(a);
    const [br, bz] = mb.coords(b);
    const ids = [a];
    for (let i = 1; i < n; i++) {
      const s = t ? t[i] : i / n;
      ids.push(mb.node(ar + s * (br - ar), az + s * (bz - az)));
    }
    ids.push(b);
    return ids;
  };
  // Surface nodes strictly between existing end nodes `a` (at angle a0) and `b` (at a1).
  const arc = (
    a: number,
    b: number,
    a0: number,
    a1: number,
    n: number,
    t?: Float64Array,
  ): number[] => {
    const ids = [a];
    for (let i = 1; i < n; i++) ids.push(surf(a0 + (t ? t[i] : i / n) * (a1 - a0)));
    ids.push(b);
    return ids;
  };
  const ring = (rho: number): number[] => {
    const ids: number[] = [];
    for (let j = 0; j <= 2 * m; j++) ids.push(polar(rho, (j / (2 * m)) * psiMax(rho)));
    return ids;
  };

  // Core around the pole.
  const s = CORE_SIDE * rhoMin;
  const pole = mb.node(0, 1);
  const aS = mb.node(0, 1 - s);
  const sS = surf(alphaOf(s));
  const surf1 = arc(pole, sS, 0, alphaOf(s), m);
  const rhoC = CORE_CORNER * rhoMin;
  const c = polar(rhoC, psiMax(rhoC) / 2);
  const axis1 = line(pole, aS, m);
  const edgeAC = line(aS, c, m);
  const edgeSC = line(sS, c, m);
  fillPatch(mb, axis1, edgeSC, surf1, edgeAC);
  const ring0 = ring(rhoMin);
  const rMid = ring0[m];
  const axis2 = line(aS, ring0[0], k);
  const surf2 = arc(sS, ring0[2 * m], alphaOf(s), alphaOf(rhoMin), k);
  const edgeCR = line(c, rMid, k);
  fillPatch(mb, axis2, edgeCR, edgeAC, ring0.slice(0, m + 1));
  fillPatch(mb, surf2, edgeCR, edgeSC, ring0.slice(m).reverse());

  // Rings of geometrically growing radius.
  const nRings = Math.max(
    1,
    Math.round(Math.log(p.ringOuter / rhoMin) / (psiMax(rhoMin) / (2 * m))),
  );
  const growth = Math.pow(p.ringOuter / rhoMin, 1 / nRings);
  const axisNodes = [...axis1, ...axis2.slice(1)];
  const surfaceNodes = [...surf1, ...surf2.slice(1)];
  let inner = ring0;
  for (let n = 1; n <= nRings; n++) {
    const outer = ring(rhoMin * Math.pow(growth, n));
    for (let j = 0; j < 2 * m; j++) mb.quad(inner[j], outer[j], outer[j + 1], inner[j + 1]);
    axisNodes.push(outer[0]);
    surfaceNodes.push(outer[2 * m]);
    inner = outer;
  }

  // The rest: bottom = midplane, top = outermost ring, left = axis, right = surface.
  const nB = Math.ceil(0.6 * 2 * m);
  const lastStep = p.ringOuter * (1 - 1 / growth);
  const origin = mb.node(0, 0);
  const equator = mb.node(1, 0);
  const alphaOuter = alphaOf(p.ringOuter);
  const sideLen = Math.PI / 2 - alphaOuter;
  const tRight = gradedPositions(nB, (growth * lastStep) / sideLen);
  const right = arc(equator, inner[2 * m], Math.PI / 2, alphaOuter, nB, reverseGrading(tRight));
  const left = line(
    origin,
    inner[0],
    nB,
    reverseGrading(gradedPositions(nB, (growth * lastStep) / (1 - p.ringOuter))),
  );
  const bottom = line(origin, equator, 2 * m);
  fillPatch(mb, bottom, inner, left, right);
  axisNodes.push(...left.slice(0, nB).reverse());
  surfaceNodes.push(...right.slice(0, nB).reverse());

  const mesh = mb.build();
  for (let i = 0; i < mesh.nodeZ.length; i++) mesh.nodeZ[i] *= aspect;
  return {
    ...mesh,
    aspect,
    surface: Int32Array.from(surfaceNodes),
    axis: Int32Array.from(axisNodes),
    midplane: Int32Array.from(bottom),
  };
}

/** Positions of the same segments listed from the other end. */
function reverseGrading(t: Float64Array): Float64Array {
  const n = t.length - 1;
  const out = new Float64Array(n + 1);
  for (let i = 0; i <= n; i++) out[i] = 1 - t[n - i];
  return out;
}
