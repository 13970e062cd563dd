import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { getCultivar } from '@/lib/data/cultivars';
import type { RevisionValue } from '@/lib/properties/records';
import { NotFoundError, ValidationError } from '@/lib/errors';
import type { Quantity } from '@/lib/properties/quantities';
import type { UsedValue } from './used-value';

export type { UsedValue } from './used-value';

export interface PinnedCultivar {
  slug: string;
  name: string;
  commodity: string;
  revisionId: number;
  revisionNumber: number;
  values: RevisionValue[];
}

/** The pinned revision as a check's answer names it (so an assessment can reproduce it). */
export function pinnedSummary(p: PinnedCultivar | null) {
  return (
    p && {
      cultivar: p.slug,
      name: p.name,
      commodity: p.commodity,
      revision_id: p.revisionId,
      revision_number: p.revisionNumber,
    }
  );
}

/**
 * The published revision of a cultivar, or a 400 on the `cultivar` field when there is no such
 * cultivar. Any other failure (the database down, say) stays what it is: a server error, not a
 * claim that the cultivar does not exist.
 */
export async function pinCultivar(actor: Actor, slug: string): Promise<PinnedCultivar> {
  const record = await getCultivar(actor, slug).catch((error: unknown) => {
    if (error instanceof NotFoundError) return null;
    throw error;
  });
  if (!record) {
    throw new ValidationError('Unknown cultivar.', { cultivar: [`No cultivar "${slug}".`] });
  }
  if (!record.published) {
    throw new ValidationError('No published data.', {
      cultivar: [`${record.name} has no published revision yet; enter the values yourself.`],
    });
  }
  return {
    slug: record.slug,
    name: record.name,
    commodity: record.commodity.name,
    revisionId: record.published.id,
    revisionNumber: record.published.number,
    values: record.values,
  };
}

function citation(v: RevisionValue): string | null {
  if (!v.source) return null;
  const who = v.source.authors?.split(/[;,]/)[0]?.trim() ?? v.source.title;
  return `${who}${v.source.year ? ` ${v.source.year}` : ''}`;
}

/** Which variants a check takes, best first: the whole fruit's modulus, the equatorial size. */
export const PREFERRED_VARIANTS: Partial<Record<Quantity, string[]>> = {
  youngs_modulus: ['apparent', 'flesh'],
  diameter: ['', 'equatorial', 'axial'],
};

/** The first value of a quantity among `values`, of the given variants in preference order. */
export function pickValue(
  values: RevisionValue[],
  quantity: Quantity,
  variants = PREFERRED_VARIANTS[quantity],
): RevisionValue | undefined {
  const candidates = values.filter((v) => v.quantity === quantity);
  return variants
    ? variants.map((want) => candidates.find((v) => v.variant === want)).find(Boolean)
    : candidates[0];
}

/** The form of a value a check used, with where it came from. */
export function enteredValue(value: number, unit: string): UsedValue {
  return { value, unit, origin: 'entered', source: null, low: null, high: null, sd: null };
}

/** The first published value of a quantity (optionally of some variants, in preference order). */
export function publishedValue(
  pinned: PinnedCultivar | null,
  quantity: Quantity,
  variants?: string[],
): UsedValue | null {
  if (!pinned) return null;
  const pick = pickValue(pinned.values, quantity, variants);
  if (!pick) return null;
  return {
    value: pick.value,
    unit: pick.unit,
    origin: pick.isTypicalDefault ? 'typical default' : 'published',
    source: citation(pick),
    low: pick.low,
    high: pick.high,
    sd: pick.sd,
  };
}

/** What the user typed wins; else the published value; else a 400 naming the missing field. */
export function chooseValue(
  field: string,
  label: string,
  entered: number | undefined,
  published: UsedValue | null,
  unit: string,
): UsedValue {
  if (entered !== undefined) return enteredValue(entered, unit);
  if (published) return published;
  throw new ValidationError(`${label} is needed.`, {
    [field]: [`${label} has no published value for this cultivar: enter one (${unit}).`],
  });
}
