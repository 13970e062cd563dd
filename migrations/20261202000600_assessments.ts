import type { Knex } from 'knex';

/**
 * Saved checks. Each row keeps the inputs, the results as computed then, and the property
 * revision they used, so a report reproduces forever; a re-run is a new row (version + 1) that
 * names the one it re-ran. Rows are never updated or deleted by the app.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('assessments', (t) => {
    t.increments('id').primary();
    t.integer('owner_id').notNullable().references('id').inTable('users');
    t.string('check', 16).notNullable(); // squeeze drop stack
    t.string('title', 200).notNullable();
    t.text('notes').nullable();
    t.text('inputs').notNullable(); // JSON
    t.text('results').notNullable(); // JSON
    t.integer('cultivar_id').nullable().references('id').inTable('cultivars');
    t.integer('revision_id').nullable().references('id').inTable('property_revisions');
    t.integer('version').notNullable().defaultTo(1);
    t.integer('parent_id').nullable().references('id').inTable('assessments');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['owner_id']);
    t.index(['cultivar_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('assessments');
}
