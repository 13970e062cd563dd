import 'server-only';
import type { Knex } from 'knex';
import { Kysely } from 'kysely';
import { BetterSQLite3ColdDialect, KyselyKnexDialect, PGColdDialect } from 'kysely-knex';
import { db } from '@/lib/db';
import type { Database } from '@/lib/db-schema';

// kysely-knex runs each compiled query through `knex.raw` on a connection Knex hands out, so the
// typed queries share Knex's pool (the tests' in-memory SQLite has one connection, and a second
// one would be another, empty database). Given a transaction, Knex hands out the transaction's
// connection, so typed reads inside `db.transaction(trx => …)` see its uncommitted rows.
const instances = new WeakMap<Knex, Kysely<Database>>();

function subDialect(knex: Knex) {
  const client = String(knex.client.config.client);
  return client === 'pg' || client === 'postgres' || client === 'postgresql'
    ? new PGColdDialect()
    : new BetterSQLite3ColdDialect();
}

/**
 * Typed queries on the app's Knex instance, or on a Knex transaction. Never call `destroy()`
 * on the result: it would destroy the Knex instance underneath.
 */
export function typed(knex: Knex | Knex.Transaction = db): Kysely<Database> {
  let kysely = instances.get(knex);
  if (!kysely) {
    kysely = new Kysely<Database>({
      dialect: new KyselyKnexDialect({ knex, kyselySubDialect: subDialect(knex) }),
    });
    instances.set(knex, kysely);
  }
  return kysely;
}
