import { describe, expect, it } from 'vitest';
import { prepareShear, solveAt, stateAt } from '../../../fem';

// Consistency check: the cached stress influence used per increment must give the same
// largest shear as the body's own recover() + stresses() on the same contact displacements.
// Every element under the contact is searched here, at any depth, so this also checks that the
// shallow-first search (the peak within one contact radius of the surface) misses nothing.
const CASES = [
  ['axisymmetric', 'sparse', 0.001, undefined],
  ['plane-strain', 'sparse', 0.001, undefined],
  ['axisymmetric', 'balanced', 0.0003, undefined],
  ['axisymmetric', 'balanced', 0.003, 0.012],
  ['axisymmetric', 'balanced', 0.0008, 0.02],
] as const;

describe('subsurface shear from the stress influence', () => {
  it.each(CASES)(
    'matches recover + stresses (%s, %s, travel %s m, pad %s m)',
    (model, mesh, travel, pad) => {
      const E = 3e6;
      const R = 0.04;
      const stage = prepareShear({
        model,
        equatorialRadius: R,
        modulus: E,
        poisson: 0.35,
        travel,
        mesh,
        ...(pad !== undefined && { padDiameter: pad, edgeRadius: 0.001 }),
      });
      const { state } = stateAt(stage, travel, undefined, true);
      const sol = solveAt(stage, travel);
      const u = stage.body.recover(sol.nodeDisplacement.map((x) => x / R));
      let best = 0;
      for (const s of stage.body.stresses(u)) {
        if (s.r > state.contactRadius / R) continue;
        const centre = (s.srr + s.szz) / 2;
        const rad = Math.hypot((s.srr - s.szz) / 2, s.srz);
        const top = Math.max(centre + rad, s.stt);
        const bottom = Math.min(centre - rad, s.stt);
        best = Math.max(best, (top - bottom) / 2);
      }
      // 1e-9 relative: two evaluation orders of the same linear map.
      expect((state.maxShear as number) / (best * E)).toBeCloseTo(1, 9);
    },
  );
});
