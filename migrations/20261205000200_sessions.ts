import type { Knex } from 'knex';

/**
 * Database sessions: the session cookie holds a random token and this table its SHA-256 (a copy of
 * the table opens no session), with the user, and when the session started, was last renewed and
 * ends. Signing out deletes the row; "sign out everywhere", a password change, disabling an
 * account and a role change delete the user's rows. Times are epoch milliseconds, compared in SQL
 * the same way on SQLite and PostgreSQL. (The old session_generation column is dropped by a later
 * step, 20261205000500, so the rollback of this step touches nothing but its own table.)
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (t) => {
    t.string('id', 64).primary();
    t.integer('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE');
    t.bigInteger('created_ms').notNullable();
    t.bigInteger('renewed_ms').notNullable();
    t.bigInteger('expires_ms').notNullable();
    t.index(['user_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sessions');
}
