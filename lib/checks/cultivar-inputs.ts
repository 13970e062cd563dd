import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { getCultivar, listPublishedCultivars } from '@/lib/data/cultivars';
import type { EvidenceSet } from '@/lib/evidence/ladder';
import { evidenceForRecords } from './evidence-set';
import type { Stage } from '@/lib/properties/quantities';
import type { CultivarRecord } from '@/lib/properties/records';
import { NotFoundError, ValidationError } from '@/lib/errors';

export type { UsedValue } from './used-value';
export { enteredValue } from '@/lib/evidence/used';

/** A published record a check drew on, so an assessment can reproduce it. */
export interface PinnedRecord {
  slug: string;
  name: string;
  revisionId: number;
  revisionNumber: number;
}

/** The cultivar a check runs for: its own revision, its commodity record's, and the evidence. */
export interface PinnedCultivar extends PinnedRecord {
  commodity: string;
  commodityId: number;
  /** True when the user chose the commodity's own record rather than a cultivar. */
  isCommodityRecord: boolean;
  /** The commodity record's published revision, when it has one (and is not the choice itself). */
  commodityRecord: PinnedRecord | null;
  stage: Stage | null;
  evidence: EvidenceSet;
}

const pinOf = (r: CultivarRecord): PinnedRecord | null =>
  r.published
    ? { slug: r.slug, name: r.name, revisionId: r.published.id, revisionNumber: r.published.number }
    : null;

/** The pinned revisions as a check's answer names them (so an assessment can reproduce it). */
export function pinnedSummary(p: PinnedCultivar | null) {
  return (
    p && {
      cultivar: p.slug,
      name: p.name,
      commodity: p.commodity,
      revision_id: p.revisionId,
      revision_number: p.revisionNumber,
      commodity_record: p.commodityRecord && {
        cultivar: p.commodityRecord.slug,
        revision_id: p.commodityRecord.revisionId,
        revision_number: p.commodityRecord.revisionNumber,
      },
      stage: p.stage,
    }
  );
}

/**
 * The published revision of a cultivar and of its commodity record, with the evidence they hold,
 * or a 400 on the `cultivar` field when there is no such cultivar. Any other failure (the database
 * down, say) stays what it is: a server error, not a claim that the cultivar does not exist.
 */
export async function pinCultivar(
  actor: Actor,
  slug: string,
  stage: Stage | null = null,
): Promise<PinnedCultivar> {
  const record = await getCultivar(actor, slug).catch((error: unknown) => {
    if (error instanceof NotFoundError) return null;
    throw error;
  });
  if (!record) {
    throw new ValidationError('Unknown cultivar.', { cultivar: [`No cultivar "${slug}".`] });
  }
  const own = pinOf(record);
  if (!own) {
    throw new ValidationError('No published data.', {
      cultivar: [`${record.name} has no published revision yet; enter the values yourself.`],
    });
  }
  const all = await listPublishedCultivars(actor, { commodity: record.commodity.slug });
  const type = record.isType ? null : all.find((r) => r.isType);
  return {
    ...own,
    commodity: record.commodity.name,
    commodityId: record.commodity.id,
    isCommodityRecord: record.isType,
    commodityRecord: type ? pinOf(type) : null,
    stage,
    evidence: evidenceForRecords(record, all, stage),
  };
}
