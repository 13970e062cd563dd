/**
 * A 2D mesh of 4-node quadrilaterals in the (r, z) meridional plane (plane strain: (x, y)).
 * Node i sits at (nodeR[i], nodeZ[i]) in m; element e has nodes quads[4e..4e+3], counter-clockwise.
 */
export interface QuadMesh {
  nodeR: Float64Array;
  nodeZ: Float64Array;
  quads: Int32Array;
}

/**
 * The quarter meridional section of a spheroid: a QuadMesh plus its boundary node lists.
 * `surface` runs along the curved surface from the pole (r = 0, z = aspect) to the equator
 * (r = 1, z = 0); `axis` holds the nodes on r = 0, `midplane` those on z = 0.
 */
export interface QuarterSectionMesh extends QuadMesh {
  aspect: number;
  surface: Int32Array;
  axis: Int32Array;
  midplane: Int32Array;
}

/** Copies the corner coordinates (m) of element `e` into `xr` and `xz` (4 entries, counter-clockwise). */
export function elementCorners(
  mesh: QuadMesh,
  e: number,
  xr: Float64Array,
  xz: Float64Array,
): void {
  for (let a = 0; a < 4; a++) {
    const v = mesh.quads[4 * e + a];
    xr[a] = mesh.nodeR[v];
    xz[a] = mesh.nodeZ[v];
  }
}

/** Growable node and element store used while a mesh is being built. */
export class MeshBuilder {
  private readonly r: number[] = [];
  private readonly z: number[] = [];
  private readonly q: number[] = [];

  /** Adds a node and returns its index. */
  node(r: number, z: number): number {
    this.r.push(r);
    this.z.push(z);
    return this.r.length - 1;
  }

  /** Coordinates (r, z) of node i. */
  coords(i: number): [number, number] {
    return [this.r[i], this.z[i]];
  }

  /** Adds a quad, flipping it to counter-clockwise order if its signed area is negative. */
  quad(a: number, b: number, c: number, d: number): void {
    const { r, z } = this;
    const twiceArea = (r[c] - r[a]) * (z[d] - z[b]) - (z[c] - z[a]) * (r[d] - r[b]);
    if (twiceArea >= 0) this.q.push(a, b, c, d);
    else this.q.push(a, d, c, b);
  }

  /** The finished mesh as typed arrays. */
  build(): QuadMesh {
    return {
      nodeR: Float64Array.from(this.r),
      nodeZ: Float64Array.from(this.z),
      quads: Int32Array.from(this.q),
    };
  }
}
