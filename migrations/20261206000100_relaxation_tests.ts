import type { Knex } from 'knex';

/**
 * Stress-relaxation tests: a fruit or a flesh cylinder held at a fixed plate travel while the
 * force falls, fitted to Peleg's F(t) = F₀·(1 − t ÷ (k₁ + k₂·t)). The file stays in the bucket
 * (storage_key); the row keeps what the fit gave at upload and what the lab said about the hold.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('relaxation_tests', (t) => {
    t.increments('id').primary();
    t.integer('cultivar_id').notNullable().references('id').inTable('cultivars');
    t.integer('uploaded_by').notNullable().references('id').inTable('users');
    t.string('storage_key', 200).notNullable();
    t.string('file_name', 200).notNullable();
    t.integer('rows').notNullable();
    // The plate travel held during the test, mm.
    t.double('deformation_mm').notNullable();
    // 'whole fruit between flat plates' or 'flesh cylinder between flat plates'.
    t.string('specimen', 60).notNullable();
    t.string('loading_rate', 60).nullable();
    t.double('temperature_c').nullable();
    t.double('f0_n').notNullable();
    t.double('k1_s').notNullable();
    t.double('k2').notNullable();
    t.double('r2_linear').notNullable();
    t.double('r2_force').notNullable();
    t.boolean('is_demo').notNullable().defaultTo(false);
    t.integer('draft_revision_id').nullable().references('id').inTable('property_revisions');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['cultivar_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('relaxation_tests');
}
