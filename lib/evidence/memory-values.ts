import { FROM_MEMORY } from '@/lib/properties/citation';
import { QUANTITIES } from '@/lib/properties/quantities';
import type { CultivarRecord, RevisionValue } from '@/lib/properties/records';
import { citationOf } from './ladder';

/** A published value that rests on memory, as the data gaps page lists it for checking. */
export interface MemoryValue {
  /** The record's slug (its page is /properties/<slug>). */
  slug: string;
  /** "Potato" for a commodity record, "Apple, Jonathan" for a cultivar. */
  record: string;
  /** The quantity in words, with its variant: "Young's modulus (flesh)". */
  figure: string;
  /** The value in its stored (SI-style) unit; the page shows it in the reader's units. */
  value: number;
  unit: string;
  /** Where it is from, in the one wording: "Finney 1967 (from memory, not yet checked)". */
  from: string;
}

/** A source recalled but not re-read, or a typical value recalled. */
export function restsOnMemory(v: RevisionValue): boolean {
  return v.source?.kind === 'memory' || (v.isTypicalDefault && v.typicalBasis === 'from memory');
}

function figureOf(v: RevisionValue): string {
  const label = QUANTITIES[v.quantity].label;
  return v.variant ? `${label} (${v.variant})` : label;
}

/** Every published value resting on memory, record by record in the order given. */
export function valuesFromMemory(records: CultivarRecord[]): MemoryValue[] {
  return records.flatMap((r) =>
    r.values.filter(restsOnMemory).map((v) => ({
      slug: r.slug,
      record: r.isType ? r.commodity.name : `${r.commodity.name}, ${r.name}`,
      figure: figureOf(v),
      value: v.value,
      unit: v.unit,
      from: v.source?.kind === 'memory' ? citationOf(v.source)! : `typical value, ${FROM_MEMORY}`,
    })),
  );
}
