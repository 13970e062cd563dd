import type { MeshBuilder } from './quad-mesh';
import { chordPositions } from './spacing';

/** One side of a patch: node ids, their coordinates (m) and normalised chord positions. */
interface Side {
  ids: number[];
  r: number[];
  z: number[];
  t: Float64Array;
}

/**
 * Fills a four-sided patch by discrete transfinite (Coons) interpolation of its boundary nodes
 * and adds its quads. Sides are node-index arrays: `bottom` and `top` run in the ξ direction
 * (same length), `left` and `right` in the η direction; bottom[0] = left[0], bottom[last] =
 * right[0], top[0] = left[last], top[last] = right[last]. Returns the (nx+1)·(ny+1) grid, i fastest.
 */
export function fillPatch(
  mb: MeshBuilder,
  bottom: number[],
  top: number[],
  left: number[],
  right: number[],
): number[] {
  const nx = bottom.length - 1;
  const ny = left.length - 1;
  const side = (ids: number[]): Side => {
    const r = ids.map((i) => mb.coords(i)[0]);
    const z = ids.map((i) => mb.coords(i)[1]);
    return { ids, r, z, t: chordPositions(r, z) };
  };
  const [b, t, l, r] = [side(bottom), side(top), side(left), side(right)];
  const grid = new Array<number>((nx + 1) * (ny + 1));
  for (let j = 0; j <= ny; j++) {
    for (let i = 0; i <= nx; i++) {
      let id: number;
      if (j === 0) id = bottom[i];
      else if (j === ny) id = top[i];
      else if (i === 0) id = left[j];
      else if (i === nx) id = right[j];
      else id = coonsNode(mb, b, t, l, r, i, j);
      grid[j * (nx + 1) + i] = id;
    }
  }
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const a = j * (nx + 1) + i;
      mb.quad(grid[a], grid[a + 1], grid[a + nx + 2], grid[a + nx + 1]);
    }
  }
  return grid;
}

/** Adds the interior node (i, j) of the patch: boundary blend minus the bilinear corner term. */
function coonsNode(
  mb: MeshBuilder,
  b: Side,
  t: Side,
  l: Side,
  r: Side,
  i: number,
  j: number,
): number {
  const nx = b.ids.length - 1;
  // Parameters where the bottom–top and left–right parameter lines cross.
  const dS = t.t[i] - b.t[i];
  const u = (b.t[i] + l.t[j] * dS) / (1 - dS * (r.t[j] - l.t[j]));
  const v = l.t[j] + u * (r.t[j] - l.t[j]);
  const blend = (bv: number, tv: number, lv: number, rv: number, c: number[]): number =>
    (1 - v) * bv +
    v * tv +
    (1 - u) * lv +
    u * rv -
    ((1 - u) * (1 - v) * c[0] + u * (1 - v) * c[1] + (1 - u) * v * c[2] + u * v * c[3]);
  const cr = [b.r[0], b.r[nx], t.r[0], t.r[nx]];
  const cz = [b.z[0], b.z[nx], t.z[0], t.z[nx]];
  return mb.node(
    blend(b.r[i], t.r[i], l.r[j], r.r[j], cr),
    blend(b.z[i], t.z[i], l.z[j], r.z[j], cz),
  );
}
