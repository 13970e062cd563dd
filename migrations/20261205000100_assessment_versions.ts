import type { Knex } from 'knex';

/**
 * Reproducible assessments: each result carries the model version and the result schema it was
 * made with, and the re-runs of one assessment are numbered within their chain (`root_id`, the
 * first assessment) under a unique constraint, so two re-runs at once cannot both become "v3".
 * Rows saved before this migration are stamped "unrecorded".
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('assessments', (t) => {
    t.string('model_version', 32).notNullable().defaultTo('unrecorded');
    t.string('result_schema', 32).notNullable().defaultTo('unrecorded');
    t.integer('root_id').nullable().references('id').inTable('assessments');
  });
  const rows: { id: number; parent_id: number | null }[] = await knex('assessments')
    .select('id', 'parent_id')
    .orderBy('id');
  const root = new Map<number, number>();
  for (const r of rows) {
    const id = Number(r.id);
    const value = r.parent_id == null ? id : (root.get(Number(r.parent_id)) ?? id);
    root.set(id, value);
    await knex('assessments').where({ id }).update({ root_id: value });
  }
  await knex.schema.alterTable('assessments', (t) => {
    t.unique(['root_id', 'version'], { indexName: 'assessments_root_version_unique' });
  });
}

// SQLite drops a column by rebuilding the table; the self-reference would refuse it.
export const config = { transaction: false };

export async function down(knex: Knex): Promise<void> {
  const sqlite = String(knex.client.config.client).includes('sqlite');
  if (sqlite) await knex.raw('PRAGMA foreign_keys = OFF');
  await knex.schema.alterTable('assessments', (t) => {
    t.dropUnique(['root_id', 'version'], 'assessments_root_version_unique');
  });
  await knex.schema.alterTable('assessments', (t) => {
    t.dropColumn('root_id');
    t.dropColumn('result_schema');
    t.dropColumn('model_version');
  });
  if (sqlite) await knex.raw('PRAGMA foreign_keys = ON');
}
