import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import type { RevisionValue } from '@/lib/data/property-rows';
import type { Quantity } from '@/lib/properties/quantities';

/** The published figures a check form shows as placeholders, keyed like the form's fields. */
export interface CultivarPrefill extends Record<string, number | undefined> {
  modulusMpa?: number;
  poisson?: number;
  diameterMm?: number;
  massG?: number;
  staticThresholdKpa?: number;
}

const FIELDS: [keyof CultivarPrefill, Quantity, string[]?][] = [
  ['modulusMpa', 'youngs_modulus', ['apparent', 'flesh']],
  ['poisson', 'poisson_ratio'],
  ['diameterMm', 'diameter', ['', 'equatorial', 'axial']],
  ['massG', 'mass'],
  ['staticThresholdKpa', 'static_bruise_threshold'],
];

function prefillOf(values: RevisionValue[]): CultivarPrefill {
  const out: CultivarPrefill = {};
  for (const [field, quantity, variants] of FIELDS) {
    const of = values.filter((v) => v.quantity === quantity);
    const pick = variants
      ? variants.map((w) => of.find((v) => v.variant === w)).find(Boolean)
      : of[0];
    if (pick) out[field] = pick.value;
  }
  return out;
}

/**
 * Published cultivars for a check's select, the ones with every figure a check needs first
 * (the others are marked, and their missing figures must be typed in).
 */
export async function cultivarOptions(actor: Actor) {
  const cultivars = await listPublishedCultivars(actor);
  const options = cultivars.map((c) => {
    const prefill = prefillOf(c.values);
    const hasMass = prefill.massG !== undefined || c.values.some((v) => v.quantity === 'density');
    const complete = ['modulusMpa', 'poisson', 'diameterMm'].every((k) => k in prefill) && hasMass;
    const label = `${c.commodity.name} — ${c.name}${complete ? '' : ' (some figures to enter)'}`;
    return { slug: c.slug, label, prefill, complete };
  });
  return options.sort((a, b) => Number(b.complete) - Number(a.complete));
}
