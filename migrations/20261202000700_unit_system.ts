import type { Knex } from 'knex';

/** Each user's display units: SI (default) or US customary. Stored values stay SI. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.string('unit_system', 4).notNullable().defaultTo('si');
  });
}

// SQLite drops a column by rebuilding the table; foreign keys from other tables would refuse it.
export const config = { transaction: false };

export async function down(knex: Knex): Promise<void> {
  const sqlite = String(knex.client.config.client).includes('sqlite');
  if (sqlite) await knex.raw('PRAGMA foreign_keys = OFF');
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('unit_system');
  });
  if (sqlite) await knex.raw('PRAGMA foreign_keys = ON');
}
