import { FemInputError } from '../errors';

/** 2-point Gauss–Legendre abscissae ±1/√3 (weights 1); exact for cubics in each direction. */
export const GAUSS_2 = [-1 / Math.sqrt(3), 1 / Math.sqrt(3)] as const;

/** Natural coordinates of the four corner nodes, counter-clockwise. */
const XI = [-1, 1, 1, -1] as const;
const ETA = [-1, -1, 1, 1] as const;

/** Shape functions and their (r, z) derivatives of a bilinear quad at one natural point (reusable). */
export class Q4Point {
  readonly n = new Float64Array(4);
  readonly dr = new Float64Array(4);
  readonly dz = new Float64Array(4);
  private readonly dXi = new Float64Array(4);
  private readonly dEta = new Float64Array(4);
  /** Jacobian determinant (m² per unit natural area) and the physical position (m). */
  detJ = 0;
  r = 0;
  z = 0;

  /**
   * Evaluates at natural (ξ, η) for corner coordinates `xr`, `xz` (m, counter-clockwise).
   * Throws FemInputError('mesh') on a non-positive Jacobian (a folded or inverted element).
   */
  evaluate(xr: ArrayLike<number>, xz: ArrayLike<number>, xi: number, eta: number): this {
    const { n, dXi, dEta } = this;
    let j11 = 0;
    let j12 = 0;
    let j21 = 0;
    let j22 = 0;
    let r = 0;
    let z = 0;
    for (let a = 0; a < 4; a++) {
      n[a] = 0.25 * (1 + XI[a] * xi) * (1 + ETA[a] * eta);
      dXi[a] = 0.25 * XI[a] * (1 + ETA[a] * eta);
      dEta[a] = 0.25 * ETA[a] * (1 + XI[a] * xi);
      j11 += dXi[a] * xr[a];
      j12 += dXi[a] * xz[a];
      j21 += dEta[a] * xr[a];
      j22 += dEta[a] * xz[a];
      r += n[a] * xr[a];
      z += n[a] * xz[a];
    }
    const det = j11 * j22 - j12 * j21;
    if (!(det > 0)) throw new FemInputError('mesh', 'an element has a non-positive Jacobian');
    this.detJ = det;
    this.r = r;
    this.z = z;
    for (let a = 0; a < 4; a++) {
      this.dr[a] = (j22 * dXi[a] - j12 * dEta[a]) / det;
      this.dz[a] = (-j21 * dXi[a] + j11 * dEta[a]) / det;
    }
    return this;
  }
}

/** Jacobian determinant of a bilinear quad at natural (ξ, η), without throwing (for mesh checks). */
export function q4Jacobian(
  xr: ArrayLike<number>,
  xz: ArrayLike<number>,
  xi: number,
  eta: number,
): number {
  let j11 = 0;
  let j12 = 0;
  let j21 = 0;
  let j22 = 0;
  for (let a = 0; a < 4; a++) {
    const dXi = 0.25 * XI[a] * (1 + ETA[a] * eta);
    const dEta = 0.25 * ETA[a] * (1 + XI[a] * xi);
    j11 += dXi * xr[a];
    j12 += dXi * xz[a];
    j21 += dEta * xr[a];
    j22 += dEta * xz[a];
  }
  return j11 * j22 - j12 * j21;
}
