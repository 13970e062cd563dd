import 'server-only';
import { typed } from '@/lib/db-kysely';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { toSource } from '@/lib/data/property-rows';
import type { SourceRef } from '@/lib/properties/records';

/** An article cites a key the sources table does not hold: a content error, never shown as a blank. */
export class UnknownSourceError extends Error {
  constructor(readonly keys: string[]) {
    super(`Unknown source key(s): ${keys.join(', ')}. Cite only keys of the sources table.`);
    this.name = 'UnknownSourceError';
  }
}

/** The sources of the given keys, in the keys' order; throws UnknownSourceError for any missing. */
export async function getSourcesByKeys(actor: Actor, keys: string[]): Promise<SourceRef[]> {
  assertCan(actor, 'atlas:read');
  const rows = keys.length
    ? await typed().selectFrom('sources').selectAll().where('key', 'in', keys).execute()
    : [];
  const byKey = new Map(rows.map((r) => [r.key, toSource(r)]));
  const missing = keys.filter((k) => !byKey.has(k));
  if (missing.length) throw new UnknownSourceError(missing);
  return keys.map((k) => byKey.get(k)!);
}
