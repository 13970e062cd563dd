import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invitations', (t) => {
    t.increments('id').primary();
    t.string('email', 254).notNullable();
    t.string('role', 16).notNullable();
    // SHA-256 of the one-time token; the token itself is only ever in the e-mail.
    t.string('token_hash', 64).notNullable().unique();
    t.integer('invited_by').notNullable().references('id').inTable('users');
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('accepted_at', { useTz: true }).nullable();
    t.integer('accepted_user_id').nullable().references('id').inTable('users');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['email']);
  });
  await knex.schema.createTable('mail_outbox', (t) => {
    t.increments('id').primary();
    t.string('message_id', 300).nullable();
    t.string('from_address', 300).notNullable();
    t.text('to_addresses').notNullable();
    t.string('subject', 500).notNullable();
    t.text('text_body').notNullable();
    t.text('html_body').nullable();
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('audit_log', (t) => {
    t.increments('id').primary();
    t.integer('actor_id').nullable().references('id').inTable('users');
    t.string('action', 64).notNullable();
    t.string('entity', 64).notNullable();
    t.string('entity_id', 64).nullable();
    t.text('detail').nullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['entity', 'entity_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_log');
  await knex.schema.dropTable('mail_outbox');
  await knex.schema.dropTable('invitations');
}
