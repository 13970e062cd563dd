import 'server-only';
import { type SqueezeInput, type Spreads } from '@/fem';
import type { Actor } from '@/lib/auth/actor';
import type { SqueezeCheckInput } from '@/lib/checks/inputs';
import { climb } from '@/lib/evidence/ladder';
import { ValidationError } from '@/lib/errors';
import type { UsedValue } from '../used-value';
import { FACING_PRESETS, frictionSurfacesFor } from '../facings';
import { relaxationOf } from './hold';
import { resultantAccelG } from './twist';
import { required, resolveFruit, type ResolvedFruit } from '../resolve-fruit';

export interface ResolvedSqueeze {
  fruit: ResolvedFruit;
  density: UsedValue;
  friction: UsedValue;
  failureStress: UsedValue | null;
  /** Peleg's relaxation constants (one published pair), or null: none on any rung. */
  relaxation: { k1: UsedValue; k2: UsedValue } | null;
  axialMm: number;
  /** The squeeze's largest travel per pad, mm: as typed, or chosen from the fruit's size. */
  maxTravelMm: number;
  maxTravelAuto: boolean;
  model: SqueezeInput;
}

/**
 * The largest travel per pad when none is typed: 5 % of the fruit's radius along the squeeze —
 * the strain up to which the linear model holds without a warning, well inside its 15 % limit —
 * whatever the fruit's size (a fixed 2 mm was too deep for a cherry tomato). Rounded down to
 * three figures, so the rounding never crosses the 5 %.
 */
export const AUTO_TRAVEL = 0.05;
export function autoTravelMm(axialMm: number): number {
  const raw = (AUTO_TRAVEL * axialMm) / 2;
  const step = 10 ** (Math.floor(Math.log10(raw)) - 2);
  return Number((Math.floor(raw / step) * step).toPrecision(3));
}

/** The squeeze case in SI from the form's figures and the cultivar's published ones. */
export async function resolveSqueeze(actor: Actor, v: SqueezeCheckInput): Promise<ResolvedSqueeze> {
  const fruit = await resolveFruit(actor, v);
  const axialMm = fruit.axialMm.value;
  if (v.gripOffsetMm >= Math.min(fruit.diameterMm.value, axialMm) / 2) {
    const message = `The grip offset must be less than the fruit's radius (${Math.min(fruit.diameterMm.value, axialMm) / 2} mm): the pads would miss the fruit.`;
    throw new ValidationError(message, { gripOffsetMm: [message] });
  }
  const density = fruit.densityKgM3;
  const friction = required(
    climb(
      fruit.evidence,
      { quantity: 'friction_coefficient', variants: frictionSurfacesFor(v.facing) },
      { entered: v.friction, unit: '–' },
    ),
    'friction',
    `Friction coefficient against ${FACING_PRESETS[v.facing].label.toLowerCase()}`,
    '–',
    fruit.evidence,
  );
  const failureStress =
    climb(fruit.evidence, { quantity: 'failure_stress' }, { unit: 'kPa' })?.used ?? null;
  const maxTravelMm = v.maxTravelMm ?? autoTravelMm(axialMm);
  const preset = FACING_PRESETS[v.facing];
  const facingModulus = v.facing === 'custom' ? v.facingModulusMpa : preset.modulusMpa;
  const facingThickness = v.facing === 'custom' ? v.facingThicknessMm : preset.thicknessMm;
  const model: SqueezeInput = {
    equatorialRadius: fruit.diameterMm.value / 2000,
    axialRadius: axialMm / 2000,
    modulus: fruit.modulusMpa.value * 1e6,
    poisson: fruit.poisson.value,
    travel: maxTravelMm / 1000,
    mesh: v.mesh,
    ...(v.padDiameterMm !== undefined && { padDiameter: v.padDiameterMm / 1000 }),
    ...(v.padEdgeMm !== undefined && { edgeRadius: v.padEdgeMm / 1000 }),
    ...(facingModulus != null && facingThickness != null
      ? {
          facingModulus: facingModulus * 1e6,
          facingThickness: facingThickness / 1000,
          facingPoisson: v.facing === 'custom' ? v.facingPoisson : (preset.poisson ?? undefined),
        }
      : {}),
    density: density.value,
    friction: friction.value,
    safetyFactor: v.safetyFactor,
    // The pads carry the resultant of weight and inertia, vertical and sideways.
    accelG: resultantAccelG(v.accelerationMs2, v.horizontalAccelerationMs2),
    ...(fruit.staticThresholdKpa ? { bruiseThreshold: fruit.staticThresholdKpa.value * 1000 } : {}),
    // Tresca: at failure in uniaxial compression the largest shear is half the failure stress.
    ...(failureStress ? { failureShear: (failureStress.value * 1000) / 2 } : {}),
  };
  const relaxation = relaxationOf(fruit.evidence);
  return {
    ...{ fruit, density, friction, failureStress, relaxation, axialMm, model },
    ...{ maxTravelMm, maxTravelAuto: v.maxTravelMm === undefined },
  };
}

/** Pad diameters for the sweep: 12 from a quarter of the pad to three pads, within the fruit. */
export function sweepDiameters(v: SqueezeCheckInput, diameterMm: number): number[] | null {
  if (v.padDiameterMm === undefined) return null;
  const edge = v.padEdgeMm ?? 2;
  const lo = Math.max(2.5 * edge, 0.25 * v.padDiameterMm, 2);
  const hi = Math.max(lo * 1.2, Math.min(3 * v.padDiameterMm, 0.9 * diameterMm));
  return Array.from({ length: 12 }, (_, i) => (lo + ((hi - lo) * i) / 11) / 1000);
}

/**
 * A used figure's band in SI (×scale), as the Monte Carlo takes it; null without one. The band
 * follows the evidence: a cultivar's own spread, the spread across the commodity for an inherited
 * value, the inputs' spreads for a derived one, a wide stated band for a typical one; a typed
 * figure is taken as exact.
 */
function spreadOf(u: UsedValue | null, scale: number) {
  if (!u || u.rung === 'entered') return null;
  if (u.sd !== null && u.sd > 0) return { sd: u.sd * scale };
  if (u.low !== null && u.high !== null && u.high > u.low)
    return { low: u.low * scale, high: u.high * scale };
  return null;
}

/** The published spreads of the inputs that have them, and which ones carry none. */
export function spreadsOf(r: ResolvedSqueeze): { spreads: Spreads; without: string[] } {
  const entries: [keyof Spreads, string, UsedValue | null, number][] = [
    ['modulus', "Young's modulus", r.fruit.modulusMpa, 1e6],
    ['poisson', "Poisson's ratio", r.fruit.poisson, 1],
    ['size', 'diameter', r.fruit.diameterMm, 1 / 2000],
    ['density', 'density', r.density, 1],
    ['friction', 'friction', r.friction, 1],
    ['bruiseThreshold', 'bruise threshold', r.fruit.staticThresholdKpa, 1000],
  ];
  const spreads: Spreads = {};
  const without: string[] = [];
  for (const [key, label, used, scale] of entries) {
    const s = spreadOf(used, scale);
    if (s) spreads[key] = s;
    else without.push(label);
  }
  return { spreads, without };
}
