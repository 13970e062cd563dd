import { describe, expect, it } from 'vitest';
import { prepareShear, solveAt, stateAt } from '../../../fem';

// Consistency check: the cached stress influence used per increment must give the same
// largest shear as the body's own recover() + stresses() on the same contact displacements.
describe('subsurface shear from the stress influence', () => {
  it.each(['axisymmetric', 'plane-strain'] as const)('matches recover + stresses (%s)', (model) => {
    const E = 3e6;
    const R = 0.04;
    const stage = prepareShear({
      model,
      equatorialRadius: R,
      modulus: E,
      poisson: 0.35,
      travel: 0.001,
      mesh: 'coarse',
    });
    const { state } = stateAt(stage, 0.001, undefined, true);
    const sol = solveAt(stage, 0.001);
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
  });
});
