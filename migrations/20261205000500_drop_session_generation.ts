import type { Knex } from 'knex';

/**
 * Sessions are rows of their own (20261205000200): ending a user's sessions deletes them, so the
 * old per-user session counter is read and written by nothing. It goes.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('session_generation');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.integer('session_generation').notNullable().defaultTo(1);
  });
}
