import type { QuarterSectionMesh } from '../mesh/quad-mesh';

/**
 * Symmetry constraints of the quarter section, one flag per DOF ([u_r0, u_z0, u_r1, …]; 1 = held
 * at zero): u_r = 0 on the axis r = 0, u_z = 0 on the mid-plane z = 0.
 */
export function symmetryConstraints(mesh: QuarterSectionMesh): Uint8Array {
  const fixed = new Uint8Array(2 * mesh.nodeR.length);
  for (const v of mesh.axis) fixed[2 * v] = 1;
  for (const v of mesh.midplane) fixed[2 * v + 1] = 1;
  return fixed;
}
