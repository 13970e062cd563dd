/**
 * Stress relaxation of fruit flesh held at a fixed deformation, and what it does to a grip.
 *
 * Peleg's normalised relaxation: a force F₀ reached by a quick deformation and then held decays
 * as F(t) = F₀ · (1 − t ÷ (k₁ + k₂·t)); 1/k₁ is the initial rate of decay and 1/k₂ the share that
 * finally relaxes (Peleg M., "Characterization of the stress relaxation curves of solid foods",
 * J. Food Science 44:277–281, 1979; the linear form F₀·t ÷ (F₀ − F(t)) = k₁ + k₂·t, eq. 2 there
 * [from memory for the equation number]).
 *
 * From a relaxation test to a grip: for a linear viscoelastic body whose Poisson's ratio does
 * not change with time, a displacement applied quickly and then held gives the force of the
 * elastic solution with the relaxation modulus E(t) in place of E, as long as the contact area
 * does not shrink (Lee E.H. & Radok J.R.M., "The contact problem for viscoelastic bodies",
 * J. Applied Mechanics 27:438–444, 1960; Ting T.C.T., J. Appl. Mech. 33:845–854, 1966, for the
 * limits). A held grip meets both conditions: the travel is fixed, so the contact area of the
 * elastic solution — which for a constant Poisson's ratio does not depend on E — stays as it
 * was. The elastic contact force at a fixed travel is proportional to E (the problem is
 * homogeneous in E), so F(t) ÷ F₀ = E(t) ÷ E₀: the relaxation a test measured at held
 * deformation carries over to the pad force unchanged. Not covered: a Poisson's ratio that
 * changes as the flesh relaxes, and a grip closed slowly compared with k₁ (then some relaxation
 * happens during closing and the initial force is lower than the elastic one — on the safe side
 * for bruising, not for holding).
 */

/** Peleg's relaxation constants: k₁ in seconds, k₂ dimensionless (≥ 1). */
export interface PelegConstants {
  k1: number;
  k2: number;
}

/** The share of the initial force still held after `t` seconds, 1 − t ÷ (k₁ + k₂·t). */
export function pelegRetained(t: number, { k1, k2 }: PelegConstants): number {
  if (t <= 0) return 1;
  return 1 - t / (k1 + k2 * t);
}

/**
 * The time, s, at which the held force has fallen to `share` of its initial value, or null when
 * it never does (the asymptote 1 − 1/k₂ lies at or above `share`). Solves 1 − t/(k₁ + k₂ t) = share:
 * t = s·k₁ ÷ (1 − s·k₂) with s = 1 − share.
 */
export function pelegTimeToShare(share: number, { k1, k2 }: PelegConstants): number | null {
  if (share >= 1) return 0;
  const s = 1 - share;
  if (s * k2 >= 1) return null;
  return (s * k1) / (1 - s * k2);
}

/** A Peleg fit of a relaxation test: the constants, the initial force and the fit's R². */
export interface PelegFit extends PelegConstants {
  /** the force at t = 0 the fit is normalised by, in the test's unit */
  f0: number;
  /** R² of the linear form t·F₀ ÷ (F₀ − F) against t */
  r2Linear: number;
  /** R² of the fitted force curve against the measured forces */
  r2Force: number;
  /** readings used (t > 0 and F < F₀) */
  points: number;
}

/**
 * Fits Peleg's constants to a relaxation test (time s, force at held deformation, any unit):
 * F₀ is the force at the first reading (t = 0, the end of loading), and k₁, k₂ are the intercept
 * and slope of the least-squares line of t·F₀ ÷ (F₀ − F) against t, Peleg's own linearisation.
 * Throws a RangeError with a plain message when the readings cannot be fitted.
 */
export function fitPeleg(times: readonly number[], forces: readonly number[]): PelegFit {
  if (times.length !== forces.length) throw new RangeError('Times and forces differ in number.');
  if (times.length < 4) throw new RangeError('At least four readings are needed for a fit.');
  for (let i = 1; i < times.length; i++)
    if (!(times[i] > times[i - 1]))
      throw new RangeError(`Times must increase (reading ${i + 1} is not after reading ${i}).`);
  if (Math.abs(times[0]) > 1e-9)
    throw new RangeError('The first reading must be at t = 0, the end of loading.');
  const f0 = forces[0];
  if (!(f0 > 0)) throw new RangeError('The force at t = 0 must be positive.');
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 1; i < times.length; i++) {
    const drop = f0 - forces[i];
    if (drop <= 0) continue;
    xs.push(times[i]);
    ys.push((times[i] * f0) / drop);
  }
  if (xs.length < 3)
    throw new RangeError('The force does not fall below its first reading: nothing relaxes.');
  const n = xs.length;
  const mx = xs.reduce((a, b) => a + b, 0) / n;
  const my = ys.reduce((a, b) => a + b, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (xs[i] - mx) ** 2;
    sxy += (xs[i] - mx) * (ys[i] - my);
    syy += (ys[i] - my) ** 2;
  }
  const k2 = sxy / sxx;
  const k1 = my - k2 * mx;
  if (!(k1 > 0) || !(k2 >= 1))
    throw new RangeError(
      `The readings do not follow Peleg's form (k₁ = ${k1.toPrecision(3)} s, k₂ = ${k2.toPrecision(3)}; k₁ must be positive and k₂ at least 1).`,
    );
  const r2Linear = syy > 0 ? (sxy * sxy) / (sxx * syy) : 1;
  const meanF = forces.reduce((a, b) => a + b, 0) / forces.length;
  let ssRes = 0;
  let ssTot = 0;
  for (let i = 0; i < times.length; i++) {
    const fit = f0 * pelegRetained(times[i], { k1, k2 });
    ssRes += (forces[i] - fit) ** 2;
    ssTot += (forces[i] - meanF) ** 2;
  }
  return { k1, k2, f0, r2Linear, r2Force: ssTot > 0 ? 1 - ssRes / ssTot : 1, points: n };
}
