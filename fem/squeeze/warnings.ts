/** What a squeeze warning is about; the app may key its display on the code. */
export type SqueezeWarningCode =
  | 'sharp-edge'
  | 'edge-contact'
  | 'pad-edge-contact'
  | 'under-resolved'
  | 'shear-unavailable'
  | 'facing-strain'
  | 'facing-poisson-assumed'
  | 'large-travel'
  | 'near-incompressible';

/** A warning on a squeeze result: a stable code and a message in plain words. */
export interface SqueezeWarning {
  code: SqueezeWarningCode;
  message: string;
}

/** Fewer contact points than this in contact make a state under-resolved. */
export const MIN_CONTACT_NODES = 8;
/** Facing compression over thickness beyond which the facing's small-strain model is stretched. */
export const FACING_STRAIN_LIMIT = 0.2;
/** Travel over the axial radius treated as small strain. */
export const SMALL_TRAVEL_FRACTION = 0.05;
/** Largest Poisson's ratio the locking-free element is checked at. */
export const CHECKED_POISSON = 0.499;

/** The warnings once each, in order of first appearance. */
export function uniqueWarnings(list: SqueezeWarning[]): SqueezeWarning[] {
  const seen = new Set<string>();
  return list.filter((w) => {
    const key = `${w.code}|${w.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

const pct = (x: number) => `${(100 * x).toFixed(x < 0.1 ? 1 : 0)} %`;

/** Warnings that follow from the inputs alone: large travel, ν above the checked range, facing ν. */
export function inputWarnings(c: {
  travel: number;
  axialRadius: number;
  poisson: number;
  facing: { poissonAssumed: boolean; poisson: number } | null;
}): SqueezeWarning[] {
  const out: SqueezeWarning[] = [];
  const fraction = c.travel / c.axialRadius;
  if (fraction > SMALL_TRAVEL_FRACTION) {
    out.push({
      code: 'large-travel',
      message:
        `The travel is ${pct(fraction)} of the fruit's radius along the squeeze. The model is ` +
        `linear (small strain), which holds up to about ${pct(SMALL_TRAVEL_FRACTION)}; beyond ` +
        'that the strains near the pad are large and the figures are indicative only.',
    });
  }
  if (c.poisson > CHECKED_POISSON) {
    out.push({
      code: 'near-incompressible',
      message:
        `Poisson's ratio ${c.poisson} is above ${CHECKED_POISSON}, the highest value the model ` +
        'is checked at; the flesh is treated as very nearly incompressible.',
    });
  }
  if (c.facing?.poissonAssumed) {
    out.push({
      code: 'facing-poisson-assumed',
      message:
        `No Poisson's ratio was given for the facing, so ${c.facing.poisson} is assumed. A thin ` +
        'bonded facing of solid rubber (close to 0.5) is much stiffer than that, which raises ' +
        'the contact pressure.',
    });
  }
  return out;
}
