import type { Knex } from 'knex';

/**
 * The three-way rebase of a draft and the workflow mail. `revision_conflicts` holds each value
 * that both the draft and the newer published revision changed since the draft's base: the three
 * versions (base, the draft's, the published one; JSON of a `revision_values` row, or null where
 * the value is absent) wait there until the author keeps theirs or takes the published one, and a
 * draft with any left cannot be submitted. `users.workflow_mail` is the per-user switch for the
 * submitted / published / returned e-mails (on unless muted).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('revision_conflicts', (t) => {
    t.increments('id').primary();
    t.integer('revision_id')
      .notNullable()
      .references('id')
      .inTable('property_revisions')
      .onDelete('CASCADE');
    // Which value: quantity, variant, source and conditions, with its occurrence among equals.
    t.string('value_key', 2000).notNullable();
    t.string('label', 300).notNullable();
    t.text('base_value').nullable();
    t.text('mine_value').nullable();
    t.text('theirs_value').nullable();
    // The published revision the conflict was found against.
    t.integer('theirs_revision_id').nullable().references('id').inTable('property_revisions');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['revision_id']);
  });
  await knex.schema.alterTable('users', (t) => {
    t.boolean('workflow_mail').notNullable().defaultTo(true);
  });
}

// SQLite drops a column by rebuilding the table; foreign keys from other tables would refuse it.
export const config = { transaction: false };

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('revision_conflicts');
  const sqlite = String(knex.client.config.client).includes('sqlite');
  if (sqlite) await knex.raw('PRAGMA foreign_keys = OFF');
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('workflow_mail');
  });
  if (sqlite) await knex.raw('PRAGMA foreign_keys = ON');
}
