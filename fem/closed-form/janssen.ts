import { STANDARD_GRAVITY } from '../constants';
import { requireNonNegative, requirePositive } from '../validate';
import { requireFiniteResult } from './finite-result';

/** A bin of bulk solids (here: fruit) with friction on its walls. */
export interface JanssenBin {
  /** bulk density of the fill ρ_b (fruit plus voids), kg/m³ (> 0) */
  bulkDensity: number;
  /** hydraulic radius R_h = cross-section area / perimeter, m (> 0); see rectangularBinHydraulicRadius */
  hydraulicRadius: number;
  /** wall friction coefficient μ_w (> 0) */
  wallFriction: number;
  /** lateral-to-vertical pressure ratio K (> 0) */
  lateralRatio: number;
  /** gravitational acceleration, m/s² (> 0); default 9.80665 */
  g?: number;
}

/** A bin and a depth in its fill (SI). */
export interface JanssenPressureInput extends JanssenBin {
  /** depth below the top surface of the fill, m (≥ 0) */
  depth: number;
}

/** A bin and the vertical pressure its fill must stay under (SI). */
export interface JanssenDepthInput extends JanssenBin {
  /** vertical pressure that must not be exceeded, Pa (> 0) */
  pressureLimit: number;
}

function checkBin(bin: JanssenBin): { g: number; decayLength: number } {
  requirePositive('bulkDensity', bin.bulkDensity);
  requirePositive('hydraulicRadius', bin.hydraulicRadius);
  requirePositive('wallFriction', bin.wallFriction);
  requirePositive('lateralRatio', bin.lateralRatio);
  const g = bin.g === undefined ? STANDARD_GRAVITY : requirePositive('g', bin.g);
  const decayLength = bin.hydraulicRadius / (bin.wallFriction * bin.lateralRatio);
  return { g, decayLength: requireFiniteResult('wallFriction', 'R_h/(μK)', decayLength) };
}

/**
 * Hydraulic radius of a rectangular bin, area / perimeter = LW / (2(L + W)), m.
 * @param length inside length, m (> 0)
 * @param width inside width, m (> 0)
 * @throws FemInputError naming 'length' or 'width'
 */
export function rectangularBinHydraulicRadius(length: number, width: number): number {
  requirePositive('length', length);
  requirePositive('width', width);
  return requireFiniteResult(
    'length',
    'the hydraulic radius',
    (length * width) / (2 * (length + width)),
  );
}

/**
 * Deep-bin limit of the Janssen vertical pressure, ρ_b g R_h/(μ_w K), Pa (Janssen 1895 [memory]).
 * @throws FemInputError naming the offending JanssenBin field
 */
export function janssenAsymptoticPressure(bin: JanssenBin): number {
  const { g, decayLength } = checkBin(bin);
  return requireFiniteResult('bulkDensity', 'the pressure', bin.bulkDensity * g * decayLength);
}

/**
 * Janssen vertical pressure at depth z, Pa:
 * σ_v = (ρ_b g R_h/(μ_w K))(1 − exp(−μ_w K z/R_h)) (Janssen 1895 [memory]).
 * Near the top it is ρ_b g z (hydrostatic); deep down it tends to janssenAsymptoticPressure.
 * @throws FemInputError naming 'depth' or the offending JanssenBin field
 */
export function janssenVerticalPressure(input: JanssenPressureInput): number {
  requireNonNegative('depth', input.depth);
  const { decayLength } = checkBin(input);
  // −expm1 keeps full precision near the top, where 1 − exp(−x) would cancel.
  return janssenAsymptoticPressure(input) * -Math.expm1(-input.depth / decayLength);
}

/**
 * Deepest fill, m, at which the Janssen vertical pressure stays at or below `pressureLimit`:
 * z = −(R_h/(μ_w K))·ln(1 − σ_lim/σ_∞) [computed, inverting janssenVerticalPressure].
 * Returns `null`, meaning "any depth", when the deep-bin limit σ_∞ does not exceed the limit;
 * never Infinity. Near the asymptote the answer is ill-conditioned: a small change in the limit
 * moves the depth a lot (condition number (eˣ − 1)/x at x = μ_w K z/R_h).
 * @throws FemInputError naming 'pressureLimit' or the offending JanssenBin field
 */
export function janssenMaxFillDepth(input: JanssenDepthInput): number | null {
  requirePositive('pressureLimit', input.pressureLimit);
  const { decayLength } = checkBin(input);
  const ratio = input.pressureLimit / janssenAsymptoticPressure(input);
  if (ratio >= 1) return null;
  return requireFiniteResult('pressureLimit', 'the depth', -decayLength * Math.log1p(-ratio));
}
