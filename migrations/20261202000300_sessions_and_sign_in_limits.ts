import type { Knex } from 'knex';

/**
 * Sessions that end: each user carries a session generation, copied into the JWT at sign-in and
 * bumped on sign-out, "sign out everywhere", password change, disable and role change; a token of
 * an older generation is refused. Sign-in limits move to rate-limiter-flexible's row layout
 * (key, points, expire in ms) so one atomic upsert counts each attempt before it is evaluated.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.integer('session_generation').notNullable().defaultTo(1);
  });
  await knex.schema.dropTable('sign_in_throttle');
  await knex.schema.createTable('sign_in_limits', (t) => {
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire').nullable();
  });
}

// SQLite drops a column by rebuilding the table, which foreign keys from other tables would
// refuse: the rollback runs outside a transaction with their checks paused.
export const config = { transaction: false };

export async function down(knex: Knex): Promise<void> {
  const sqlite = String(knex.client.config.client).includes('sqlite');
  if (sqlite) await knex.raw('PRAGMA foreign_keys = OFF');
  await knex.schema.dropTable('sign_in_limits');
  await knex.schema.createTable('sign_in_throttle', (t) => {
    t.string('key', 300).primary();
    t.integer('failures').notNullable().defaultTo(0);
    t.bigInteger('window_started_ms').notNullable();
    t.bigInteger('locked_until_ms').nullable();
  });
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('session_generation');
  });
  if (sqlite) await knex.raw('PRAGMA foreign_keys = ON');
}
