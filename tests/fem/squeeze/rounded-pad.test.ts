import { describe, expect, it } from 'vitest';
import { runSqueeze, type MeshLevel } from '../../../fem';
import { roundedPadOnSphere, sneddonAtForce } from '../support/sneddon';

// Inputs invented: a large sphere (R = 0.5 m, so the contact radius a ≈ 3.4 mm ≪ R and the
// fruit acts as a half-space), E = 3 MPa, ν = 0.35, a 10 mm pad with a 2 mm rounded edge (flat
// radius 3 mm), 0.28 mm travel: the contact reaches 0.44 mm onto the rounding.
const R = 0.5;
const E = 3e6;
const NU = 0.35;
const ESTAR = E / (1 - NU * NU); // rigid pad (Johnson, Contact Mechanics, 1985, ch. 4)
const TRAVEL = 0.00028;
const profile = roundedPadOnSphere(R, 0.005, 0.002); // sphere curvature + flat + rounded edge

function compare(mesh: MeshLevel) {
  const res = runSqueeze({
    equatorialRadius: R,
    modulus: E,
    poisson: NU,
    travel: TRAVEL,
    steps: 1,
    mesh,
    padDiameter: 0.01,
    edgeRadius: 0.002,
  });
  // Sneddon's solution at the model's force: the half-space has no far field of its own, so the
  // pressure and contact radius are compared at equal load.
  const ref = sneddonAtForce(profile, res.final.force, ESTAR, 0.00499);
  const rs = Array.from({ length: 1001 }, (_, i) => (i / 1000) * ref.contactRadius);
  const refPeak = Math.max(...rs.map(ref.pressure));
  const row = {
    peak: res.final.peakPressure / refPeak - 1,
    radius: res.final.contactRadius / ref.contactRadius - 1,
    centre: res.profile[0].pressure / ref.pressure(0) - 1,
    approach: ref.approach / TRAVEL - 1,
  };
  console.log(
    `${mesh}: ${res.mesh.nodes} nodes; against Sneddon: peak ${(100 * row.peak).toFixed(2)} %, ` +
      `a ${(100 * row.radius).toFixed(2)} %, centre ${(100 * row.centre).toFixed(2)} %, ` +
      `approach at the same force ${(100 * row.approach).toFixed(2)} %`,
  );
  return row;
}

describe('rounded flat pad on a large sphere against Sneddon (Int. J. Eng. Sci. 3, 1965, 47)', () => {
  const normal = compare('balanced');

  it('peak pressure, contact radius and centre pressure on the balanced mesh', () => {
    // Observed: peak +0.95 %, a −0.20 %, centre −0.25 %, approach +0.47 %. Limits at 2.5–3× the
    // observed error: the peak sits on the rounding, where the refined band puts about 5 nodes
    // across the 0.44 mm between the flat's end and the contact's edge.
    expect(Math.abs(normal.peak)).toBeLessThan(0.025);
    expect(Math.abs(normal.radius)).toBeLessThan(0.005);
    expect(Math.abs(normal.centre)).toBeLessThan(0.008);
    // The force–travel relation of the half-space: 1.5 %, the finite sphere's own compliance
    // (of order a/R ≈ 0.7 %) on top of the discretisation.
    expect(Math.abs(normal.approach)).toBeLessThan(0.015);
  });

  it('the peak converges with refinement', () => {
    // Observed: coarse +6.9 %, normal +0.95 %, fine +0.52 %.
    const coarse = compare('sparse');
    const fine = compare('dense');
    expect(Math.abs(fine.peak)).toBeLessThan(Math.abs(normal.peak));
    expect(Math.abs(normal.peak)).toBeLessThan(Math.abs(coarse.peak));
    expect(Math.abs(fine.peak)).toBeLessThan(0.015);
  }, 60_000);
});
