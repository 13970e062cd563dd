import type { Knex } from 'knex';

/**
 * An invitation can end before it is used: revoked by its inviter or an admin, or replaced when
 * the same address is invited again or the link is resent. The old link then explains which.
 * The index serves the per-inviter hourly limit.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('invitations', (t) => {
    t.timestamp('revoked_at', { useTz: true }).nullable();
    t.integer('revoked_by').nullable().references('id').inTable('users');
    t.timestamp('replaced_at', { useTz: true }).nullable();
    t.integer('replaced_by').nullable().references('id').inTable('invitations');
    t.index(['invited_by', 'created_at'], 'invitations_inviter_created_index');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('invitations', (t) => {
    t.dropIndex(['invited_by', 'created_at'], 'invitations_inviter_created_index');
    t.dropForeign(['replaced_by']);
    t.dropForeign(['revoked_by']);
    t.dropColumn('replaced_by');
    t.dropColumn('replaced_at');
    t.dropColumn('revoked_by');
    t.dropColumn('revoked_at');
  });
}
