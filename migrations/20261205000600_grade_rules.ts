import type { Knex } from 'knex';

/**
 * Grade rules: the largest bruise a grade tolerates, per commodity (or any commodity), from a
 * published grading standard, the research definition of a critical bruise, or the site's own
 * rule entered by an admin. A check's verdict compares its predicted bruise with one of them.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('grade_rules', (t) => {
    t.increments('id').primary();
    t.string('slug', 80).notNullable().unique();
    t.string('name', 160).notNullable();
    // null: a rule for any commodity (a research definition, say).
    t.integer('commodity_id').nullable().references('id').inTable('commodities');
    t.string('kind', 16).notNullable(); // standard research site
    // The largest bruise tolerated: a surface diameter in mm, or a surface area in mm².
    t.string('measure', 16).notNullable(); // diameter area
    t.double('limit_value').notNullable();
    // The depth a standard also limits, mm (checked only where a check predicts a depth).
    t.double('max_depth_mm').nullable();
    t.integer('source_id').nullable().references('id').inTable('sources');
    t.text('note').nullable();
    t.integer('created_by').nullable().references('id').inTable('users');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['commodity_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('grade_rules');
}
