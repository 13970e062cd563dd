import { MeshBuilder } from '../mesh/quad-mesh';
import { condense } from '../solver/condense';
import type { BodyModel } from '../types';
import { assembleStiffness } from './assembly';

/** Growth of the element size through the layer's depth and beyond its last loaded radius. */
const GROWTH = 1.25;

/** A pad facing of its own: an elastic layer bonded to a rigid backing (unit body lengths). */
export interface FacingLayerSpec {
  model: BodyModel;
  /** thickness of the layer over the equatorial radius of the fruit */
  thickness: number;
  poisson: number;
  /** outer radius of the layer (the pad's), unit lengths */
  outer: number;
  /** radii of the surface points whose axial compliance is wanted, rising from 0, all ≤ outer */
  radii: Float64Array;
}

/**
 * Axial compliance of the facing's free surface at the given points (dense row-major n × n,
 * modulus 1 Pa, unit lengths; scale by 1/(E_l·R) axisymmetric or 1/E_l plane strain, per metre).
 * The layer is meshed with mean-dilatation quads on a grid whose columns sit at the points (and
 * grow to the layer's edge, which is free) and whose rows grade from the surface down to the
 * backing, where both displacements are held; u_r = 0 on the axis. The top surface is loaded
 * only through the contact (frictionless), so the compliance is that of the condensed layer.
 */
export function facingLayerCompliance(spec: FacingLayerSpec): Float64Array {
  const rs = columns(spec.radii, spec.outer);
  const zs = rows(spec.thickness, spec.radii.length > 1 ? spec.radii[1] : spec.outer);
  const mb = new MeshBuilder();
  const id = (i: number, j: number) => j * rs.length + i;
  zs.forEach((z) => rs.forEach((r) => mb.node(r, -z)));
  for (let j = 0; j + 1 < zs.length; j++) {
    for (let i = 0; i + 1 < rs.length; i++) {
      mb.quad(id(i, j + 1), id(i + 1, j + 1), id(i + 1, j), id(i, j));
    }
  }
  const mesh = mb.build();
  const k = assembleStiffness(mesh, spec.model, 1, spec.poisson);
  const fixed = new Uint8Array(k.n);
  const bottom = zs.length - 1;
  rs.forEach((_, i) => (fixed[2 * id(i, bottom)] = fixed[2 * id(i, bottom) + 1] = 1));
  zs.forEach((_, j) => (fixed[2 * id(0, j)] = 1));
  const n = spec.radii.length;
  const keep = Array.from({ length: n }, (_, i) => 2 * id(i, 0) + 1);
  const sys = condense(k, keep, fixed, [keep[0]]);
  return invertSpd(sys.kstar, n);
}

/** Column radii: the points, then sizes growing by GROWTH out to the layer's edge. */
function columns(radii: Float64Array, outer: number): number[] {
  const rs = Array.from(radii);
  let step = rs.length > 1 ? rs[rs.length - 1] - rs[rs.length - 2] : outer / 8;
  while (rs[rs.length - 1] < outer * (1 - 1e-9)) {
    step *= GROWTH;
    const next = rs[rs.length - 1] + step;
    rs.push(next > outer - 0.3 * step ? outer : next);
  }
  return rs;
}

/** Depths from the surface (0) to the backing: ≥ 4 rows, the first at most the first column width. */
function rows(thickness: number, firstWidth: number): number[] {
  let h = Math.min(thickness / 4, firstWidth);
  const zs = [0];
  while (zs[zs.length - 1] + h < thickness * (1 - 1e-9)) {
    zs.push(zs[zs.length - 1] + h);
    h = Math.min(h * GROWTH, thickness / 4);
  }
  if (thickness - zs[zs.length - 1] < 0.3 * h && zs.length > 4) zs.pop();
  zs.push(thickness);
  return zs;
}

/** The inverse of a symmetric positive definite n × n matrix (dense row-major), by Cholesky. */
function invertSpd(a: Float64Array, n: number): Float64Array {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = 0.5 * (a[i * n + j] + a[j * n + i]);
      for (let k = 0; k < j; k++) s -= l[i * n + k] * l[j * n + k];
      l[i * n + j] = i === j ? Math.sqrt(s) : s / l[j * n + j];
    }
  }
  const inv = new Float64Array(n * n);
  const col = new Float64Array(n);
  for (let c = 0; c < n; c++) {
    col.fill(0);
    col[c] = 1;
    for (let i = 0; i < n; i++) {
      let s = col[i];
      for (let k = 0; k < i; k++) s -= l[i * n + k] * col[k];
      col[i] = s / l[i * n + i];
    }
    for (let i = n - 1; i >= 0; i--) {
      let s = col[i];
      for (let k = i + 1; k < n; k++) s -= l[k * n + i] * col[k];
      col[i] = s / l[i * n + i];
    }
    for (let i = 0; i < n; i++) inv[i * n + c] = col[i];
  }
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < i; j++)
      inv[i * n + j] = inv[j * n + i] = 0.5 * (inv[i * n + j] + inv[j * n + i]);
  }
  return inv;
}
