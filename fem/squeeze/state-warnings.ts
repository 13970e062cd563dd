import type { SqueezeCase } from './01-input';
import type { SqueezeState } from './05-shear';
import { FACING_STRAIN_LIMIT, MIN_CONTACT_NODES, type SqueezeWarning } from './warnings';

const pct = (x: number) => `${(100 * x).toFixed(0)} %`;

/**
 * Fraction of the edge radius past the flat beyond which the rounded edge is steep: its slope
 * s/√(r_e² − s²) passes 4/3 there, far from the small surface slopes that linear contact
 * theory assumes (Johnson, Contact Mechanics, 1985, ch. 3–5), and the pressure grows without
 * settling as the mesh is refined.
 */
const STEEP_EDGE = 0.8;

/**
 * Warnings for one state (`where`: 'at the grip', 'at the full travel'): the contact on the pad's
 * rounded edge or on its steep outer part, too few points in contact, shear not sampled,
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
  const steep = flat === null ? Infinity : flat + STEEP_EDGE * (reach - flat);
  if (flat !== null && s.contactRadius >= steep) {
    out.push({
      code: 'pad-edge-contact',
      message:
        `The contact ${where} reaches the steep outer part of the pad's rounded edge: the ` +
        'pressure there rises sharply and depends on the mesh, and a larger pad, a larger edge ' +
        'radius or a softer facing would spread the load.',
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
