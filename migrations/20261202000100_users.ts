import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.string('email', 254).notNullable().unique();
    t.string('name', 100).notNullable();
    t.string('password_hash', 100).notNullable();
    t.string('role', 16).notNullable();
    t.boolean('disabled').notNullable().defaultTo(false);
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('sign_in_throttle', (t) => {
    t.string('key', 300).primary();
    t.integer('failures').notNullable().defaultTo(0);
    t.bigInteger('window_started_ms').notNullable();
    t.bigInteger('locked_until_ms').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_throttle');
  await knex.schema.dropTable('users');
}
