import type { Knex } from 'knex';

/**
 * The property database: commodities and cultivars, the sources every value cites, versioned
 * property revisions and their values (each with unit, spread, method, conditions and source),
 * follows, photos and compression tests. Portable schema builder only (SQLite and PostgreSQL).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('commodities', (t) => {
    t.increments('id').primary();
    t.string('slug', 60).notNullable().unique();
    t.string('name', 100).notNullable();
    t.string('family', 60).notNullable();
    t.string('botanical_name', 120).nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('sources', (t) => {
    t.increments('id').primary();
    // A short citation key, used by articles and seeds alike: one source, one record.
    t.string('key', 80).notNullable().unique();
    t.string('kind', 16).notNullable(); // paper thesis standard handbook report secondary memory demo
    t.text('authors').nullable();
    t.integer('year').nullable();
    t.text('title').notNullable();
    t.string('venue', 300).nullable();
    t.string('pages', 40).nullable();
    t.string('doi', 200).nullable();
    t.string('url', 500).nullable();
    // How the value was read: abstract, secondary, memory, full text.
    t.text('note').nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('cultivars', (t) => {
    t.increments('id').primary();
    t.integer('commodity_id').notNullable().references('id').inTable('commodities');
    t.string('slug', 80).notNullable().unique();
    t.string('name', 120).notNullable();
    // True for "the commodity in general" when a source measured no named cultivar.
    t.boolean('is_type').notNullable().defaultTo(false);
    t.integer('published_revision_id').nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['commodity_id']);
  });
  await knex.schema.createTable('property_revisions', (t) => {
    t.increments('id').primary();
    t.integer('cultivar_id').notNullable().references('id').inTable('cultivars');
    t.integer('number').notNullable();
    t.string('status', 16).notNullable(); // draft in_review returned published superseded
    t.integer('author_id').notNullable().references('id').inTable('users');
    t.integer('reviewer_id').nullable().references('id').inTable('users');
    t.text('review_comment').nullable();
    t.integer('based_on_id').nullable().references('id').inTable('property_revisions');
    t.text('summary').nullable();
    t.boolean('is_demo').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('submitted_at', { useTz: true }).nullable();
    t.timestamp('reviewed_at', { useTz: true }).nullable();
    t.timestamp('published_at', { useTz: true }).nullable();
    t.timestamp('superseded_at', { useTz: true }).nullable();
    t.unique(['cultivar_id', 'number']);
    t.index(['cultivar_id', 'status']);
  });
  await knex.schema.createTable('revision_values', (t) => {
    t.increments('id').primary();
    t.integer('revision_id').notNullable().references('id').inTable('property_revisions');
    t.string('quantity', 40).notNullable();
    // Which kind or surface: 'apparent' / 'flesh' modulus, 'equatorial' diameter, 'steel' drop…
    t.string('variant', 60).notNullable().defaultTo('');
    t.double('value').notNullable();
    t.string('unit', 16).notNullable();
    t.double('low').nullable();
    t.double('high').nullable();
    t.double('sd').nullable();
    t.integer('samples').nullable();
    t.string('method', 300).nullable();
    t.string('ripeness', 120).nullable();
    t.string('temperature', 60).nullable();
    t.string('storage', 200).nullable();
    t.string('loading_rate', 60).nullable();
    t.string('probe', 120).nullable();
    t.text('note').nullable();
    // A value with no source behind it, kept only because a check needs one: shown as such.
    t.boolean('is_typical_default').notNullable().defaultTo(false);
    t.integer('source_id').nullable().references('id').inTable('sources');
    t.integer('position').notNullable().defaultTo(0);
    t.index(['revision_id']);
  });
  await knex.schema.createTable('follows', (t) => {
    t.integer('user_id').notNullable().references('id').inTable('users');
    t.integer('cultivar_id').notNullable().references('id').inTable('cultivars');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['user_id', 'cultivar_id']);
  });
  await knex.schema.createTable('images', (t) => {
    t.increments('id').primary();
    t.integer('cultivar_id').notNullable().references('id').inTable('cultivars');
    t.string('storage_prefix', 200).notNullable();
    t.string('original_type', 40).notNullable();
    t.integer('width').notNullable();
    t.integer('height').notNullable();
    t.integer('bytes').notNullable();
    t.string('caption', 300).nullable();
    t.string('credit', 200).nullable();
    t.boolean('is_demo').notNullable().defaultTo(false);
    t.integer('uploaded_by').notNullable().references('id').inTable('users');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['cultivar_id']);
  });
  await knex.schema.createTable('compression_tests', (t) => {
    t.increments('id').primary();
    t.integer('cultivar_id').notNullable().references('id').inTable('cultivars');
    t.integer('uploaded_by').notNullable().references('id').inTable('users');
    t.string('storage_key', 200).notNullable();
    t.string('file_name', 200).notNullable();
    t.integer('rows').notNullable();
    t.double('diameter_mm').nullable();
    t.double('radius1_mm').nullable();
    t.double('radius2_mm').nullable();
    t.double('poisson').notNullable();
    t.double('modulus_mpa').notNullable();
    t.double('r_squared').notNullable();
    t.double('fit_from_mm').notNullable();
    t.double('fit_to_mm').notNullable();
    t.text('note').nullable();
    t.boolean('is_demo').notNullable().defaultTo(false);
    t.integer('draft_revision_id').nullable().references('id').inTable('property_revisions');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['cultivar_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'compression_tests',
    'images',
    'follows',
    'revision_values',
    'property_revisions',
    'cultivars',
    'sources',
    'commodities',
  ]) {
    await knex.schema.dropTable(table);
  }
}
