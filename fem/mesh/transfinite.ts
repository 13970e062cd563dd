import type { MeshBuilder } from './quad-mesh';
import { chordPositions } from './spacing';

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
  const xy = (ids: number[]): [number[], number[]] => {
    const r = ids.map((i) => mb.coords(i)[0]);
    const z = ids.map((i) => mb.coords(i)[1]);
    return [r, z];
  };
  const [bR, bZ] = xy(bottom);
  const [tR, tZ] = xy(top);
  const [lR, lZ] = xy(left);
  const [rR, rZ] = xy(right);
  const sB = chordPositions(bR, bZ);
  const sT = chordPositions(tR, tZ);
  const tL = chordPositions(lR, lZ);
  const tRt = chordPositions(rR, rZ);
  const grid = new Array<number>((nx + 1) * (ny + 1));
  for (let j = 0; j <= ny; j++) {
    for (let i = 0; i <= nx; i++) {
      let id: number;
      if (j === 0) id = bottom[i];
      else if (j === ny) id = top[i];
      else if (i === 0) id = left[j];
      else if (i === nx) id = right[j];
      else {
        // Parameters where the bottom–top and left–right parameter lines cross.
        const dS = sT[i] - sB[i];
        const u = (sB[i] + tL[j] * dS) / (1 - dS * (tRt[j] - tL[j]));
        const v = tL[j] + u * (tRt[j] - tL[j]);
        const blend = (b: number, t: number, l: number, r: number, c: number[]): number =>
          (1 - v) * b +
          v * t +
          (1 - u) * l +
          u * r -
          ((1 - u) * (1 - v) * c[0] + u * (1 - v) * c[1] + (1 - u) * v * c[2] + u * v * c[3]);
        const cr = [bR[0], bR[nx], tR[0], tR[nx]];
        const cz = [bZ[0], bZ[nx], tZ[0], tZ[nx]];
        id = mb.node(blend(bR[i], tR[i], lR[j], rR[j], cr), blend(bZ[i], tZ[i], lZ[j], rZ[j], cz));
      }
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
