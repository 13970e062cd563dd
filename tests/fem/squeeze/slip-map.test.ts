import { describe, expect, it } from 'vitest';
import {
  runCase,
  slipMapAtGrip,
  slipMapAtTravel,
  slipMapOfRun,
  type SqueezeInput,
} from '../../../fem';
import { expectFieldError } from '../closed-form/expect-close';

// A sphere squeezed by a rigid flat plate at small travel, inputs invented: R = 40 mm, E = 3 MPa,
// ν = 0.3, μ = 0.4 (a typical value for fruit skin on plastic [common practice]).
const R = 0.04;
const E = 3e6;
const nu = 0.3;
const mu = 0.4;
const Estar = E / (1 - nu * nu); // Johnson, Contact Mechanics, 1985, ch. 4: rigid counterface
const sphere = (extra: Partial<SqueezeInput> = {}): SqueezeInput => ({
  equatorialRadius: R,
  modulus: E,
  poisson: nu,
  travel: 0.001,
  steps: 1,
  mesh: 'balanced',
  density: 840,
  friction: mu,
  ...extra,
});
const ratios = [0.1, 0.3, 0.5, 0.7, 0.9];

/** Largest |c − c_CM| over T/μP in `ratios`, in m, and the node spacing h at the pole. */
function stickErrors(input: SqueezeInput, travel: number, cm: (P: number, u: number) => number) {
  const P = slipMapAtTravel(input, travel, 0).normalForce;
  const errors = ratios.map((u) => {
    const m = slipMapAtTravel(input, travel, u * mu * P);
    return Math.abs(m.stickRadius - cm(P, u));
  });
  const nodes = slipMapAtTravel(input, travel, 0).nodes;
  return { worst: Math.max(...errors), h: nodes[1].r - nodes[0].r };
}

// Cattaneo–Mindlin for a Hertz point contact (Johnson 1985, §7.2 [from memory]):
// c = a(1 − T/μP)^{1/3}, with the Hertz radius a = (3PR/4E*)^{1/3} of the FE pad force P.
const pointCM = (P: number, u: number) => Math.cbrt((3 * P * R) / (4 * Estar)) * Math.cbrt(1 - u);
// Its line-contact form (Johnson 1985, §7.2 [from memory]): c = b(1 − T/μP)^{1/2}, with the
// Hertz half-width b = (4PR/πE*)^{1/2} of the force per metre P (Johnson 1985, ch. 4).
const lineCM = (P: number, u: number) =>
  Math.sqrt((4 * P * R) / (Math.PI * Estar)) * Math.sqrt(1 - u);

describe('slip map on the finite-element pressure against Cattaneo–Mindlin', () => {
  it.each([0.0003, 0.001])('stick radius of the sphere within 0.4 node spacings, %s m', (d) => {
    const { worst, h } = stickErrors(sphere({ travel: d }), d, pointCM);
    // The FE contact radius is interpolated between nodes from the gaps (within ~0.3 % of Hertz
    // at T = 0 here); the stick radius is the contact radius of the smaller load. Observed
    // ≤ 0.27 h over coarse, normal and dense meshes and both travels; tolerance 0.4 h.
    expect(worst).toBeLessThan(0.4 * h);
  });

  it('the stick-radius error shrinks with the mesh', () => {
    const coarse = stickErrors(sphere({ travel: 0.0003, mesh: 'sparse' }), 0.0003, pointCM);
    const fine = stickErrors(sphere({ travel: 0.0003, mesh: 'dense' }), 0.0003, pointCM);
    // Observed 0.080 mm (coarse) and 0.020 mm (fine): the error follows the node spacing.
    expect(fine.worst).toBeLessThan(0.5 * coarse.worst);
  });

  it('stick half-width of the plane-strain disc within 0.4 node spacings', () => {
    const input = sphere({ model: 'plane-strain' });
    const { worst, h } = stickErrors(input, 0.001, lineCM);
    // Observed ≤ 0.25 h over the three meshes at 0.3 and 1 mm travel; tolerance 0.4 h.
    expect(worst).toBeLessThan(0.4 * h);
  });

  it('traction follows the Cattaneo–Mindlin profile', () => {
    const P = slipMapAtTravel(sphere(), 0.001, 0).normalForce;
    const a = Math.cbrt((3 * P * R) / (4 * Estar));
    const p0 = (3 * P) / (2 * Math.PI * a * a); // Hertz peak (Johnson 1985, ch. 4)
    for (const u of [0.3, 0.7]) {
      const m = slipMapAtTravel(sphere(), 0.001, u * mu * P);
      const c = pointCM(P, u);
      const h = m.nodes[1].r - m.nodes[0].r;
      for (const node of m.nodes) {
        const root = (x: number) => Math.sqrt(Math.max(x * x - node.r * node.r, 0));
        const q = ((mu * p0) / a) * (root(a) - root(c)); // Johnson 1985, §7.2 [from memory]
        const err = Math.abs(node.traction - q) / (mu * p0);
        // The piecewise-linear recovered pressure cannot follow the square-root kinks of q at c
        // and a; its error rings out over about five node spacings. Beyond them: observed
        // ≤ 0.0015 μp₀ on the balanced mesh, tolerance 0.004; within: observed ≤ 0.06, tolerance 0.12.
        const nearKink = Math.min(Math.abs(node.r - c), Math.abs(node.r - a)) < 5 * h;
        expect(err).toBeLessThan(nearKink ? 0.12 : 0.004);
      }
    }
  });
});

describe('slip map at the grip point', () => {
  const input = sphere({ travel: 0.002, steps: 20, padDiameter: 0.03, safetyFactor: 2 });

  it('under the lift load the utilisation is 1/SF and the stick zone is Cattaneo–Mindlin', () => {
    const g = slipMapAtGrip(input);
    const m = g.map!;
    // Two-pad grip rule 2μN ≥ SF·m(g + a) [common practice]: at the grip μP = SF·T_lift, to the
    // grip search tolerance (the lift ratio there is 1 within < 1e-3).
    expect(g.designLoad).toBeCloseTo(2 * g.liftLoad, 12);
    expect(m.utilisation as number).toBeLessThanOrEqual(0.5);
    expect(m.utilisation as number).toBeGreaterThan(0.5 * (1 - 1e-3));
    const h = m.nodes[1].r - m.nodes[0].r;
    // Against the FE's own contact radius (the 30 mm pad is far outside the ≈ 3.7 mm contact):
    // same 0.4 h as above.
    const c = m.contactRadius * Math.cbrt(1 - (m.utilisation as number));
    expect(Math.abs(m.stickRadius - c)).toBeLessThan(0.4 * h);
    const states = m.nodes.map((node) => node.state);
    expect(states.indexOf('slip')).toBeGreaterThan(0);
    expect(states.lastIndexOf('stick')).toBeLessThan(states.indexOf('slip'));
    expect(m.grossSliding).toBe(false);
  });

  it('under the design load the grip is on the verge of sliding, but holds', () => {
    const g = slipMapAtGrip(input);
    const m = slipMapAtGrip(input, g.designLoad).map!;
    expect(m.grossSliding).toBe(false);
    // The grip travel is the upper end of a bracketed search whose lift ratio there is ≥ 1 and
    // < 1 + 1e-3.
    expect(m.utilisation as number).toBeGreaterThan(1 - 1e-3);
    expect(m.stickRadius).toBeLessThan(0.25 * m.contactRadius);
    expect(slipMapAtGrip(input, 1.0001 * g.designLoad).map!.grossSliding).toBe(true);
  });

  it('has no map when the travel never lifts the fruit, and needs friction', () => {
    const g = slipMapAtGrip({ ...input, travel: 0.00005, steps: 2 });
    expect(g.map).toBeNull();
    expect(g.reason).toContain('lift ratio');
    expectFieldError(
      () => slipMapAtGrip({ ...input, density: undefined, friction: undefined }),
      'density',
    );
    expectFieldError(
      () => slipMapAtTravel({ ...input, density: undefined, friction: undefined }, 0.001, 1),
      'friction',
    );
    expectFieldError(() => slipMapAtTravel(input, 0.001, -1), 'tangentialLoad');
  });
});

describe('slip map of a run already made', () => {
  it('equals the slip map at the grip, from one squeeze', () => {
    const input = sphere({ travel: 0.002, steps: 20, padDiameter: 0.03, safetyFactor: 2 });
    // Same computation on the same case: deep equality, no tolerance.
    expect(slipMapOfRun(runCase(input, true))).toEqual(slipMapAtGrip(input));
  });

  it('is taken on the body the grip was found on when the run regraded for it', () => {
    // μ = 0.8, SF = 1: the 40 mm sphere lifts at a small travel whose contact the increments'
    // mesh under-resolves, so runCase finds the grip on a regraded body (gripStage).
    const input = sphere({
      travel: 0.002,
      steps: 20,
      padDiameter: 0.03,
      friction: 0.8,
      safetyFactor: 1,
    });
    const run = runCase(input, false);
    expect(run.gripStage).not.toBeNull();
    const grip = run.liftability!.grip!;
    const m = slipMapOfRun(run).map!;
    // The map re-solves the grip travel cold on that body; the active set is unique, so the
    // normal force equals the grip's to round-off (1e-12 relative). On the increments' body it
    // would be 0.5 % lower (1.373 against 1.380 N when this was written).
    expect(Math.abs(m.normalForce / grip.force - 1)).toBeLessThan(1e-12);
  });
});
