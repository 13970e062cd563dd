import type { SqueezeCase } from './01-input';
import type { SqueezeState } from './05-shear';
import { FACING_STRAIN_LIMIT, MIN_CONTACT_NODES, type SqueezeWarning } from './warnings';

const pct = (x: number) => `${(100 * x).toFixed(0)} %`;

/**
 * Warnings for one state (`where`: 'at the grip', 'at the full travel'): the contact on the pad's
 * rounded edge or at its outer edge, too few points in contact, shear that could not be sampled,
 * and a facing compressed past FACING_STRAIN_LIMIT. `reach` is the pad's outer radius, m.
 */
export function stateWarnings(
  c: SqueezeCase,
  reach: number,
  s: SqueezeState,
  where: string,
): SqueezeWarning[] {
  const out: SqueezeWarning[] = [];
  const flat = c.pad.flatRadius;
  if (flat !== null && s.contactRadius >= reach * (1 - 1e-9)) {
    out.push({
      code: 'pad-edge-contact',
      message:
        `The contact ${where} reaches the outer edge of the pad: the pressure there rises ` +
        'sharply, and a larger pad, a larger edge radius or a softer facing would spread the load.',
    });
  } else if (flat !== null && s.contactRadius > flat) {
    out.push({
      code: 'edge-contact',
      message:
        `The contact ${where} spreads onto the rounded edge of the pad: the pressure rises at ` +
        'the edge, and a larger pad or a softer facing would spread the load.',
    });
  }
  if (s.force > 0 && s.activeNodes < MIN_CONTACT_NODES) {
    out.push({
      code: 'under-resolved',
      message:
        `Only ${s.activeNodes} mesh points lie in the contact ${where} (fewer than ` +
        `${MIN_CONTACT_NODES}), so its peak pressure and shear are coarse estimates; a finer ` +
        'mesh level resolves it.',
    });
  }
  if (s.maxShearUnavailable !== null) {
    out.push({
      code: 'shear-unavailable',
      message: `The largest shear ${where} is not available: ${s.maxShearUnavailable}.`,
    });
  }
  if (s.facingStrain !== null && s.facingStrain > FACING_STRAIN_LIMIT) {
    out.push({
      code: 'facing-strain',
      message:
        `The facing is compressed by ${pct(s.facingStrain)} of its thickness ${where}, more ` +
        `than ${pct(FACING_STRAIN_LIMIT)}: beyond the small-strain elastic model of the layer, ` +
        'so the pressures are indicative only; a thicker or stiffer facing stays within it.',
    });
  }
  return out;
}
