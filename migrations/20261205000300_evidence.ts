import type { Knex } from 'knex';

/**
 * The evidence a value is: the ripeness stage it was measured at (firm, firm-ripe, ripe), what a
 * drop or impact figure observed (no bruise, bruised at, recommended maximum), and why a typical
 * value is kept (common practice, or from memory). Existing drop and impact values were all
 * stored as thresholds; they are audited by the seed, and marked 'no-bruise' here only so the
 * column is filled.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('revision_values', (t) => {
    t.string('stage', 20).nullable();
    t.string('observation', 20).nullable();
    t.string('typical_basis', 20).nullable();
  });
  await knex('revision_values')
    .whereIn('quantity', ['drop_threshold_height', 'impact_threshold_energy'])
    .update({ observation: 'no-bruise' });
  await knex('revision_values')
    .where({ is_typical_default: true })
    .update({ typical_basis: 'common practice' });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('revision_values', (t) => {
    t.dropColumn('typical_basis');
    t.dropColumn('observation');
    t.dropColumn('stage');
  });
}
