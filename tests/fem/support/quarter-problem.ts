// Test helper: a quarter-section mesh with its symmetry constraints and a solve under surface pressure.
import { assembleStiffness } from '../../../fem/body/assembly';
import { symmetryConstraints } from '../../../fem/body/symmetry';
import { addEdgePressure } from './edge-load';
import { centroidStresses } from '../../../fem/elements/element-stresses';
import { MESH_LEVEL_PARAMS } from '../../../fem/mesh/mesh-levels';
import { quarterEllipseMesh } from '../../../fem/mesh/quarter-ellipse';
import { solveSymmetric } from './symmetric-solve';
import type { BodyModel, MeshLevel, StressSample } from '../../../fem/types';

export interface PressureCase {
  model: BodyModel;
  level: MeshLevel;
  aspect: number;
  poisson: number;
  /** pressure (Pa, unit modulus body) on the first `edges` surface segments from the pole */
  pressure: number;
  edges: number | 'all';
}

/** Solves the unit-modulus quarter section with u_r = 0 on the axis and u_z = 0 on the mid-plane. */
export function solvePressureCase(c: PressureCase): {
  mesh: ReturnType<typeof quarterEllipseMesh>;
  f: Float64Array;
  stresses: StressSample[];
} {
  const mesh = quarterEllipseMesh(c.aspect, MESH_LEVEL_PARAMS[c.level]);
  const k = assembleStiffness(mesh, c.model, 1, c.poisson);
  const fixed = symmetryConstraints(mesh);
  const f = new Float64Array(k.n);
  const axi = c.model === 'axisymmetric';
  const edges = c.edges === 'all' ? mesh.surface.length - 1 : c.edges;
  for (let i = 0; i < edges; i++) {
    addEdgePressure(
      f,
      mesh.nodeR,
      mesh.nodeZ,
      mesh.surface[i],
      mesh.surface[i + 1],
      c.pressure,
      axi,
    );
  }
  const u = solveSymmetric(k, f, fixed);
  return { mesh, f, stresses: centroidStresses(mesh, c.model, 1, c.poisson, u) };
}
