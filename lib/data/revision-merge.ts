import type { Selectable } from 'kysely';
import type { RevisionValuesTable } from '@/lib/db-schema';
import { QUANTITIES, isQuantity } from '@/lib/properties/quantities';

/**
 * A stored value as the three-way rebase compares it: a `revision_values` row without its id,
 * revision and position. Pure (no database), so the merge is tested on hand-made value sets.
 */
export type StoredValue = Omit<Selectable<RevisionValuesTable>, 'id' | 'revision_id' | 'position'>;

/** What names a value: what was measured, from which source, under which conditions. */
const IDENTITY = [
  'quantity',
  'variant',
  'source_id',
  'stage',
  'observation',
  'ripeness',
  'temperature',
  'storage',
  'probe',
  'loading_rate',
] as const satisfies readonly (keyof StoredValue)[];

/** What a value says: its figures and the words around them. */
const CONTENT = [
  'value',
  'unit',
  'low',
  'high',
  'sd',
  'samples',
  'method',
  'note',
  'typical_basis',
] as const satisfies readonly (keyof StoredValue)[];

const norm = (x: unknown) => (x === undefined || x === '' ? null : x);

function identityOf(v: StoredValue): string {
  return JSON.stringify([...IDENTITY.map((k) => norm(v[k])), Boolean(v.is_typical_default)]);
}

export function sameValue(a: StoredValue | null, b: StoredValue | null): boolean {
  if (a === null || b === null) return a === b;
  return identityOf(a) === identityOf(b) && CONTENT.every((k) => Object.is(norm(a[k]), norm(b[k])));
}

/**
 * Each value's key: its identity and which occurrence of that identity it is in its revision
 * (the same source may give two figures under the same conditions), in the revision's order.
 */
export function keyed<T extends StoredValue>(values: T[]): Map<string, T> {
  const seen = new Map<string, number>();
  const out = new Map<string, T>();
  for (const v of values) {
    const id = identityOf(v);
    const n = seen.get(id) ?? 0;
    seen.set(id, n + 1);
    out.set(`${id}#${n}`, v);
  }
  return out;
}

/** A value's name in words, e.g. `Static bruise threshold (belt rubber)`. */
export function valueLabel(v: Pick<StoredValue, 'quantity' | 'variant' | 'stage'>): string {
  const name = isQuantity(v.quantity) ? QUANTITIES[v.quantity].label : v.quantity;
  const parts = [v.variant, v.stage].filter(Boolean).join(', ');
  return parts ? `${name} (${parts})` : name;
}

export interface MergeConflict<T extends StoredValue = StoredValue> {
  key: string;
  label: string;
  base: T | null;
  mine: T | null;
  theirs: T | null;
}

export interface MergeResult<T extends StoredValue = StoredValue> {
  /** The draft after the rebase: its own values, with the changes made only upstream applied. */
  merged: T[];
  /** Values the newer revision added, changed or removed and the draft had left alone. */
  carried: { key: string; label: string; before: T | null; after: T | null }[];
  /** Values both changed differently; the draft keeps its own until the author decides. */
  conflicts: MergeConflict<T>[];
}

/**
 * Three-way merge of a draft onto a newer published revision, value by value: `base` is the
 * revision the draft started from, `mine` the draft, `theirs` the newest published revision.
 * A value only theirs changed (added, changed or removed) is taken from theirs; one only the draft
 * changed stays as the draft has it; one both changed alike is kept once; one both changed
 * differently is a conflict — the draft keeps its version for now and the conflict is reported.
 * New values from theirs follow the draft's own, in theirs' order.
 */
export function mergeRevisionValues<T extends StoredValue>(
  base: T[],
  mine: T[],
  theirs: T[],
): MergeResult<T> {
  const [b, m, t] = [keyed(base), keyed(mine), keyed(theirs)];
  const keys = [...new Set([...m.keys(), ...t.keys(), ...b.keys()])];
  const result: MergeResult<T> = { merged: [], carried: [], conflicts: [] };
  for (const key of keys) {
    const [bv, mv, tv] = [b.get(key) ?? null, m.get(key) ?? null, t.get(key) ?? null];
    const label = valueLabel((mv ?? tv ?? bv)!);
    if (sameValue(mv, tv) || sameValue(bv, tv)) {
      if (mv) result.merged.push(mv);
    } else if (sameValue(bv, mv)) {
      if (tv) result.merged.push(tv);
      result.carried.push({ key, label, before: mv, after: tv });
    } else {
      if (mv) result.merged.push(mv);
      result.conflicts.push({ key, label, base: bv, mine: mv, theirs: tv });
    }
  }
  return result;
}
