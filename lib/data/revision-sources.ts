import 'server-only';
import { db } from '@/lib/db';
import { insertedId, isUniqueViolation } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit-trail';
import { ValidationError } from '@/lib/errors';
import { parseInput } from '@/lib/validation/parse';
import { sourceSchema } from '@/lib/validation/sources';

const TAKEN = (key: string) =>
  new ValidationError('That key is taken.', {
    key: [
      `A source with the key "${key}" exists already: choose it from the list, or use another key.`,
    ],
  });

/** An editor adds a source a draft's values can cite; validated, unique by key, audited. */
export async function createSource(actor: Actor, input: unknown) {
  assertCan(actor, 'revisions:edit');
  const source = parseInput(sourceSchema, input);
  try {
    return await db.transaction(async (trx) => {
      if (await trx('sources').where({ key: source.key }).first()) throw TAKEN(source.key);
      const [row] = await trx('sources')
        .insert({ ...source, created_at: new Date() })
        .returning('id');
      const id = insertedId(row);
      await recordAudit(trx, {
        actorId: actor.id,
        action: 'source.create',
        entity: 'source',
        entityId: source.key,
        detail: { kind: source.kind, title: source.title },
      });
      return { id, key: source.key };
    });
  } catch (error) {
    // A racing editor took the key between the check and the insert.
    if (isUniqueViolation(error)) throw TAKEN(source.key);
    throw error;
  }
}
