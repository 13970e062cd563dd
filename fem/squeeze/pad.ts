import { FemInputError } from '../errors';
import { requirePositive } from '../validate';
import type { SqueezeWarning } from './warnings';

/** Default radius of the rounded edge of a finite pad (m). */
export const DEFAULT_EDGE_RADIUS = 0.002;

/** Below this edge radius (m) the edge pressure is singular in the limit and depends on the mesh. */
export const SHARP_EDGE_RADIUS = 0.0002;

/**
 * Pad geometry. `diameter: null` is an infinite flat plate. Otherwise `diameter` (m) is the
 * overall face diameter D: a flat disc of radius D/2 − r_e, then a quarter-circle edge of radius
 * r_e (m) that turns away from the fruit and ends, vertical, at radius D/2. Plane strain reads
 * D as the pad width across the slice.
 */
export interface PadGeometry {
  diameter: number | null;
  edgeRadius: number | null;
  /** radius (m) of the flat part of the face; null for a plate */
  flatRadius: number | null;
  /** the pad's own warnings (sharp edge), with codes; were plain strings before this edition */
  warnings: SqueezeWarning[];
}

/** Pad inputs in SI (m): omit `diameter` for an infinite flat plate. */
export interface PadSpec {
  diameter?: number;
  edgeRadius?: number;
}

/**
 * Checks and builds the pad. The edge radius defaults to 2 mm, or to D/4 when the pad is too
 * small for that. Throws FemInputError on `padDiameter` or `edgeRadius`.
 */
export function createPad(spec: PadSpec): PadGeometry {
  if (spec.diameter === undefined) {
    if (spec.edgeRadius !== undefined) {
      throw new FemInputError('edgeRadius', 'edgeRadius needs a padDiameter (a plate has no edge)');
    }
    return { diameter: null, edgeRadius: null, flatRadius: null, warnings: [] };
  }
  const diameter = requirePositive('padDiameter', spec.diameter);
  const half = diameter / 2;
  const edgeRadius =
    spec.edgeRadius === undefined
      ? Math.min(DEFAULT_EDGE_RADIUS, half / 2)
      : requirePositive('edgeRadius', spec.edgeRadius);
  if (edgeRadius >= half) {
    throw new FemInputError('edgeRadius', 'edgeRadius must be less than half the padDiameter');
  }
  const warnings: SqueezeWarning[] = [];
  if (edgeRadius < SHARP_EDGE_RADIUS) {
    warnings.push({
      code: 'sharp-edge',
      message:
        'The pad edge radius is below 0.2 mm: a sharp edge gives a singular edge pressure, so ' +
        'the peak pressure at the edge depends on the mesh and is not a reliable figure.',
    });
  }
  return { diameter, edgeRadius, flatRadius: half - edgeRadius, warnings };
}

/**
 * Axial lift of the pad face above its lowest plane at radius r (m), ≥ 0: zero on the flat part,
 * r_e − √(r_e² − (r − b)²) on the rounded edge, and Infinity beyond the pad (no contact possible).
 */
export function padLift(pad: PadGeometry, r: number): number {
  if (pad.flatRadius === null || pad.edgeRadius === null) return 0;
  const s = r - pad.flatRadius;
  if (s <= 0) return 0;
  if (s > pad.edgeRadius) return Infinity;
  return pad.edgeRadius - Math.sqrt(pad.edgeRadius * pad.edgeRadius - s * s);
}

/** Outer radius (m) where a pad can touch: D/2, or Infinity for a plate. */
export function padReach(pad: PadGeometry): number {
  return pad.diameter === null ? Infinity : pad.diameter / 2;
}
