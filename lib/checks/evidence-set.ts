import type { EvidenceSet } from '@/lib/evidence/ladder';
import type { Stage } from '@/lib/properties/quantities';
import type { CultivarRecord } from '@/lib/properties/records';

/** The evidence a record has: its own values, its commodity record's, and every record's. */
export function evidenceForRecords(
  record: CultivarRecord,
  all: CultivarRecord[],
  stage: Stage | null,
): EvidenceSet {
  const type = all.find((r) => r.isType && r.commodity.id === record.commodity.id);
  const mine = all.filter((r) => r.commodity.id === record.commodity.id);
  return {
    commodityName: record.commodity.name,
    own: record.isType ? [] : record.values,
    commodity: record.isType ? record.values : (type?.values ?? []),
    across: mine.map((r) => r.values),
    stage,
  };
}
