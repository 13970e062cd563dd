/**
 * Stage 8 of the squeeze pipeline: margin versus pad size, one run of stage 7 per pad diameter.
 */
import { FemInputError } from '../errors';
import type { SqueezeInput } from './01-input';
import { runCase, squeezeWarnings } from './07-run';
import type { SqueezeWarning } from './warnings';

/** One pad size of a sweep, SI; margins > 1 are safe, null when not computable. */
export interface PadSweepPoint {
  /** overall pad face diameter D, m */
  padDiameter: number;
  /** pad force and peak pressure at the full travel, N (N/m) and Pa */
  finalForce: number;
  finalPeakPressure: number;
  /** grip travel (m), force (N), peak pressure (Pa); null if the fruit is not lifted */
  gripTravel: number | null;
  gripForce: number | null;
  gripPeakPressure: number | null;
  bruiseMargin: number | null;
  shearMargin: number | null;
  /** why there is no grip, or null */
  reason: string | null;
  /** pad warnings, and those of the grip (or the full travel without one), with codes (were strings) */
  warnings: SqueezeWarning[];
}

/**
 * Margin versus pad size: runs the squeeze of `input` for each pad diameter (m), reusing the cached
 * condensed body, and reports the grip point and margins per diameter. The edge radius of `input`
 * (or its default) applies to every pad. Shear is evaluated at the grip point only.
 * @throws FemInputError naming 'padDiameters' (empty or more than 200) or any bad input field
 */
export function sweepPadDiameters(
  input: SqueezeInput,
  diameters: readonly number[],
): PadSweepPoint[] {
  if (!Array.isArray(diameters) || diameters.length === 0 || diameters.length > 200) {
    throw new FemInputError('padDiameters', 'padDiameters must list 1 to 200 diameters');
  }
  return diameters.map((padDiameter) => {
    const { stage, track, liftability: lift } = runCase({ ...input, padDiameter }, false);
    const final = track[track.length - 1].state;
    const grip = lift?.grip ?? null;
    return {
      padDiameter,
      finalForce: final.force,
      finalPeakPressure: final.peakPressure,
      gripTravel: grip?.travel ?? null,
      gripForce: grip?.force ?? null,
      gripPeakPressure: grip?.peakPressure ?? null,
      bruiseMargin: grip?.bruiseMargin ?? null,
      shearMargin: grip?.shearMargin ?? null,
      reason: lift === null ? 'no liftability inputs (density and friction)' : lift.reason,
      warnings: squeezeWarnings(stage, grip ?? final, grip ? 'at the grip' : 'at the full travel'),
    };
  });
}
