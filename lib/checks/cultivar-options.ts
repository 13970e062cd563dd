import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { pickValue } from './cultivar-inputs';
import type { RevisionValue } from '@/lib/properties/records';
import type { Quantity } from '@/lib/properties/quantities';

/** The published figures a check form shows as placeholders, keyed like the form's fields. */
export interface CultivarPrefill extends Record<string, number | undefined> {
  modulusMpa?: number;
  poisson?: number;
  diameterMm?: number;
  massG?: number;
  staticThresholdKpa?: number;
}

const FIELDS: [keyof CultivarPrefill, Quantity][] = [
  ['modulusMpa', 'youngs_modulus'],
  ['poisson', 'poisson_ratio'],
  ['diameterMm', 'diameter'],
  ['massG', 'mass'],
  ['staticThresholdKpa', 'static_bruise_threshold'],
];

/** The figures a check would take from these values (the same choice as resolveFruit). */
function prefillOf(values: RevisionValue[]): CultivarPrefill {
  const out: CultivarPrefill = {};
  for (const [field, quantity] of FIELDS) {
    const pick = pickValue(values, quantity);
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

/** The cultivar a check page starts on: the one asked for, else the first with every figure. */
export function initialCultivar(options: { slug: string; complete: boolean }[], wanted?: string) {
  return (
    options.find((o) => o.slug === wanted)?.slug ?? options.find((o) => o.complete)?.slug ?? ''
  );
}
