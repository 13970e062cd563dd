import { describe, expect, it } from 'vitest';
import { effectiveModulus, hertzImpact, hertzImpactMaxDropHeight } from '../../../fem/closed-form';
import { expectFieldError, expectRelative } from './expect-close';

const E_STAR = effectiveModulus(3e6, 0.35); // invented illustrative inputs, not data
const BODY = { mass: 0.2, radius: 0.04, effectiveModulus: E_STAR };

/** RK4 of m·ẍ = −(4/3)E*R^½ x^(3/2) from x = 0, ẋ = V until the body leaves the flat. */
function integrateImpact(mass: number, radius: number, modulus: number, velocity: number) {
  const k = (4 / 3) * modulus * Math.sqrt(radius);
  const accel = (x: number) => (-k * Math.max(x, 0) ** 1.5) / mass;
  // Step from the dimensional time scale (m²/(k²V))^(1/5) of the problem, 1/20 000 of it.
  const dt = ((mass * mass) / (k * k * velocity)) ** 0.2 / 20_000;
  let [t, x, v, peak] = [0, 0, velocity, 0];
  for (let step = 0; step < 10_000_000; step++) {
    const [k1x, k1v] = [v, accel(x)];
    const [k2x, k2v] = [v + (dt / 2) * k1v, accel(x + (dt / 2) * k1x)];
    const [k3x, k3v] = [v + (dt / 2) * k2v, accel(x + (dt / 2) * k2x)];
    const [k4x, k4v] = [v + dt * k3v, accel(x + dt * k3x)];
    const xNext = x + (dt / 6) * (k1x + 2 * k2x + 2 * k3x + k4x);
    const vNext = v + (dt / 6) * (k1v + 2 * k2v + 2 * k3v + k4v);
    if (xNext < 0) return { maxApproach: peak, contactTime: t + (dt * x) / (x - xNext), k };
    [t, x, v] = [t + dt, xNext, vNext];
    peak = Math.max(peak, x);
  }
  throw new Error('impact integration did not finish');
}

describe('hertzImpact', () => {
  it('reproduces the worked example: impact on a rigid flat', () => {
    // Worked example, computed from the quasi-static Hertz impact relations V = √(2gh),
    // δ* = (15mV²/(16E*R^½))^(2/5), F* = (4/3)E*R^½δ*^(3/2) (K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, §11.4
    // [section recalled from memory]): m = 0.2 kg, R = 40 mm, h = 100 mm → V = 1.40 m/s, δ* = 3.11 mm, F* = 158 N, p₀* = 607 kPa,
    // t ≈ 6.5 ms. Tolerance 0.5 % for the 3-figure entries, 1 % for the 2-figure contact time.
    const s = hertzImpact({ ...BODY, dropHeight: 0.1 });
    expectRelative(s.velocity, 1.4, 0.005);
    expectRelative(s.maxApproach, 3.11e-3, 0.005);
    expectRelative(s.peakForce, 158, 0.005);
    expectRelative(s.peakPressure, 607e3, 0.005);
    expectRelative(s.contactTime, 6.5e-3, 0.01);
    // Energy ½mV² = mgh with standard gravity 9.80665 m/s²; round-off only.
    expectRelative(s.impactEnergy, 0.2 * 9.80665 * 0.1, 1e-12);
  });

  it('agrees with a direct integration of the Hertz equation of motion', () => {
    // Newton's second law with the Hertz force law F = (4/3)E*R^½δ^(3/2) (Johnson 1985, ch. 4,
    // quasi-static impact §11.4) integrated here by RK4. Tolerance 1e-6: the integration
    // and the interpolated exit time are good to ≈ 1e-7; the quoted 2.94 alone would miss by 1e-3.
    for (const [mass, radius, modulus, dropHeight] of [
      [0.2, 0.04, E_STAR, 0.1],
      [0.02, 0.012, 0.45e6, 0.3],
      [1.5, 0.05, 2.5e6, 0.01],
    ]) {
      const s = hertzImpact({ mass, radius, effectiveModulus: modulus, dropHeight });
      const ode = integrateImpact(mass, radius, modulus, s.velocity);
      expectRelative(s.maxApproach, ode.maxApproach, 1e-6);
      expectRelative(s.peakForce, ode.k * ode.maxApproach ** 1.5, 1e-6);
      expectRelative(s.contactTime, ode.contactTime, 1e-6);
    }
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(() => hertzImpact({ ...BODY, dropHeight: 0 }), 'dropHeight');
    expectFieldError(() => hertzImpact({ ...BODY, dropHeight: 0.1, mass: -0.2 }), 'mass');
    expectFieldError(() => hertzImpact({ ...BODY, dropHeight: 0.1, radius: Infinity }), 'radius');
    expectFieldError(() => hertzImpact({ ...BODY, dropHeight: 0.1, g: 0 }), 'g');
    expectFieldError(() => hertzImpact({ ...BODY, dropHeight: 1e300, mass: 1e300 }), 'dropHeight');
  });
});

describe('hertzImpactMaxDropHeight', () => {
  it('round-trips with hertzImpact over several bodies and heights', () => {
    // The inverse is derived in closed form from the same relations; a round trip must close to
    // round-off (1e-10 relative, a few operations of powers 2/5 and 5/2).
    for (const [mass, radius, modulus] of [
      [0.2, 0.04, E_STAR],
      [0.01, 0.01, 0.3e6],
      [0.35, 0.045, 4e6],
    ]) {
      for (const dropHeight of [0.002, 0.03, 0.1, 0.6, 1.5]) {
        const body = { mass, radius, effectiveModulus: modulus };
        const { peakPressure } = hertzImpact({ ...body, dropHeight });
        const back = hertzImpactMaxDropHeight({ ...body, pressureLimit: peakPressure });
        expectRelative(back, dropHeight, 1e-10);
      }
    }
  });

  it('keeps the peak pressure at or below the limit, and just above it exceeds the limit', () => {
    // p₀* rises monotonically with h (∝ h^(1/5), Johnson 1985 §11.4 [from memory]), so 1 % less
    // height must stay below the limit and 1 % more must exceed it.
    const limit = 0.29e6; // apple flesh failure stress, Food & Machinery 31(5) [read, abstract]
    const h = hertzImpactMaxDropHeight({ ...BODY, pressureLimit: limit });
    expect(hertzImpact({ ...BODY, dropHeight: h * 0.99 }).peakPressure).toBeLessThan(limit);
    expect(hertzImpact({ ...BODY, dropHeight: h * 1.01 }).peakPressure).toBeGreaterThan(limit);
  });

  it('rejects bad input naming the field', () => {
    expectFieldError(
      () => hertzImpactMaxDropHeight({ ...BODY, pressureLimit: 0 }),
      'pressureLimit',
    );
    expectFieldError(() => hertzImpactMaxDropHeight({ ...BODY, pressureLimit: 1e5, g: -9.8 }), 'g');
    expectFieldError(
      () => hertzImpactMaxDropHeight({ ...BODY, pressureLimit: 1e300 }),
      'pressureLimit',
    );
  });
});
