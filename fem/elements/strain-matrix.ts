import type { Q4Point } from './quad4';

/**
 * Fills the strain–displacement matrix B (row-major, rows × 8, rows = 4 axisymmetric, 3 plane
 * strain) of a bilinear quad at an evaluated point; element DOFs are [u_r0, u_z0, u_r1, u_z1, …].
 * Axisymmetric rows: ε_rr = ∂u_r/∂r, ε_zz = ∂u_z/∂z, ε_θθ = u_r/r (hoop), γ_rz; plane strain
 * rows: ε_xx, ε_yy, γ_xy. Needs r > 0 for the hoop row (true at interior Gauss points, centroids).
 */
export function fillStrainMatrix(p: Q4Point, axisymmetric: boolean, b: Float64Array): void {
  const rows = axisymmetric ? 4 : 3;
  b.fill(0, 0, rows * 8);
  const shearRow = rows - 1;
  for (let a = 0; a < 4; a++) {
    const cr = 2 * a;
    const cz = cr + 1;
    b[cr] = p.dr[a];
    b[8 + cz] = p.dz[a];
    if (axisymmetric) b[16 + cr] = p.n[a] / p.r;
    b[8 * shearRow + cr] = p.dz[a];
    b[8 * shearRow + cz] = p.dr[a];
  }
}
