import type { Knex } from 'knex';

/**
 * One cheap aggregate over what the index is built from: it changes when a revision is created,
 * edited, submitted, returned or published (updated_at and the published pointers move), and when
 * a cultivar, commodity or source is added or changed.
 */
export async function dataFingerprint(knex: Knex): Promise<string> {
  const [row] = await knex.select(
    knex.raw('(select count(*) from property_revisions) as revisions'),
    knex.raw('(select max(updated_at) from property_revisions) as revised'),
    knex.raw('(select count(*) from cultivars) as cultivars'),
    knex.raw('(select sum(published_revision_id) from cultivars) as published'),
    knex.raw('(select count(*) from commodities) as commodities'),
    knex.raw('(select count(*) from sources) as sources'),
    knex.raw('(select max(id) from sources) as last_source'),
  );
  return JSON.stringify(row, (_k, v) => (v instanceof Date ? v.toISOString() : v));
}
