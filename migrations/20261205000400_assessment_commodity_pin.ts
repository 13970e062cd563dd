import type { Knex } from 'knex';

/**
 * An assessment pins every revision it drew on: the cultivar's (revision_id) and, where a figure
 * was inherited, the commodity record's, so the "newer data" flag and a re-run cover both.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('assessments', (t) => {
    t.integer('commodity_revision_id').nullable().references('id').inTable('property_revisions');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('assessments', (t) => {
    t.dropColumn('commodity_revision_id');
  });
}
