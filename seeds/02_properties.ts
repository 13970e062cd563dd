import type { Knex } from 'knex';
import { valueRow } from '../lib/data/value-row';
import { revisionValueSchema } from '../lib/validation/revisions';
import { COMMODITIES } from './property-data/commodities';
import { SOURCES } from './property-data/sources';
import type { SeedValue } from './property-data/types';

const insertedId = (row: unknown) =>
  typeof row === 'object' ? Number((row as { id: number }).id) : Number(row);

/** Check a seed value with the same rules as an editor's form, so the seed cannot hold less. */
function checked(cultivar: string, v: SeedValue) {
  const parsed = revisionValueSchema.safeParse({
    ...v,
    variant: v.variant ?? '',
    sourceKey: v.source,
  });
  if (!parsed.success) {
    throw new Error(
      `seed value ${cultivar}/${v.quantity}: ${parsed.error.issues.map((i) => i.message).join('; ')}`,
    );
  }
  return parsed.data;
}

/**
 * The property database's published first revisions, authored by the seed editor and published
 * by the seed admin (demo accounts). Runs once: an existing catalogue is left as it is.
 */
export async function seed(knex: Knex): Promise<void> {
  if (((await knex('commodities').count({ n: '*' }))[0].n as number) > 0) return;
  const author = await knex('users').where({ email: 'editor2@kestrelvale.example' }).first();
  const reviewer = await knex('users').where({ email: 'admin@kestrelvale.example' }).first();
  const now = new Date();
  const sourceIds = new Map<string, number>();
  for (const s of SOURCES) {
    const [row] = await knex('sources')
      .insert({
        key: s.key,
        kind: s.kind,
        authors: s.authors,
        year: s.year,
        title: s.title,
        venue: s.venue ?? null,
        pages: s.pages ?? null,
        doi: s.doi ?? null,
        url: s.url ?? null,
        note: s.note,
        created_at: now,
      })
      .returning('id');
    sourceIds.set(s.key, insertedId(row));
  }
  for (const c of COMMODITIES) {
    const [commodityRow] = await knex('commodities')
      .insert({
        slug: c.slug,
        name: c.name,
        family: c.family,
        botanical_name: c.botanicalName ?? null,
        created_at: now,
      })
      .returning('id');
    for (const cv of c.cultivars) {
      const [cultivarRow] = await knex('cultivars')
        .insert({
          commodity_id: insertedId(commodityRow),
          slug: cv.slug,
          name: cv.name,
          is_type: Boolean(cv.isType),
          created_at: now,
        })
        .returning('id');
      const cultivarId = insertedId(cultivarRow);
      if (!cv.values.length) continue;
      const [revisionRow] = await knex('property_revisions')
        .insert({
          cultivar_id: cultivarId,
          number: 1,
          status: 'published',
          author_id: author.id,
          reviewer_id: reviewer.id,
          summary: 'First entry from published sources.',
          created_at: now,
          updated_at: now,
          submitted_at: now,
          reviewed_at: now,
          published_at: now,
        })
        .returning('id');
      const revisionId = insertedId(revisionRow);
      await knex('revision_values').insert(
        cv.values.map((raw, position) => {
          const v = checked(cv.slug, raw);
          const sourceId = v.sourceKey ? sourceIds.get(v.sourceKey) : null;
          if (v.sourceKey && !sourceId)
            throw new Error(`seed value ${cv.slug}: unknown source ${v.sourceKey}`);
          return valueRow(v, revisionId, position, sourceId ?? null);
        }),
      );
      await knex('cultivars')
        .where({ id: cultivarId })
        .update({ published_revision_id: revisionId });
    }
  }
}
