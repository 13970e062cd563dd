import type { Knex } from 'knex';
import { valueRow } from '../lib/data/value-row';
import { revisionValueSchema } from '../lib/validation/revisions';

/**
 * Demo-only workflow records for the demonstration packhouse: a revision waiting for review and
 * one returned with a comment, each based on the published revision with one invented value
 * citing a demo source. Authors are editor2@ and admin@ (not editor@), so the editor@ lists the
 * browser tests read hold only what those tests create. Runs once: skipped if any demo revision
 * exists.
 */
const DEMO_NOTE = 'Demo record: invented for the demonstration packhouse, not a measurement.';

const DEMO_SOURCE = {
  key: 'demo-kestrel-vale-packhouse',
  kind: 'demo',
  authors: 'Kestrel Vale Packhouse (demo)',
  year: 2026,
  title: 'In-house handling trials of the demonstration packhouse',
  venue: 'Demo data',
  note: DEMO_NOTE,
};

interface DemoRevision {
  cultivar: string;
  author: string;
  status: 'in_review' | 'returned';
  summary: string;
  reviewer?: string;
  reviewComment?: string;
  value: Record<string, unknown>;
}

const DEMO_REVISIONS: DemoRevision[] = [
  {
    cultivar: 'pear-williams',
    author: 'editor2@kestrelvale.example',
    status: 'in_review',
    summary: "Demo: adds the packhouse's own probe modulus for this season's intake (invented).",
    value: {
      quantity: 'youngs_modulus',
      variant: 'apparent',
      value: 1.42,
      sd: 0.21,
      samples: 12,
      method: 'Whole fruit compressed by a probe (demo trial)',
      probe: '8 mm diameter cylinder with a curved end',
      loadingRate: '7 mm/min',
      storage: 'Harvest week of the 2026 intake',
      note: DEMO_NOTE,
    },
  },
  {
    cultivar: 'avocado-fuerte',
    author: 'admin@kestrelvale.example',
    status: 'returned',
    reviewer: 'editor2@kestrelvale.example',
    reviewComment:
      'Demo: name the belt and how many fruit were dropped, and say whether 400 mm bruised or did not.',
    summary: 'Demo: drop height onto the grading-line belt from a packhouse trial (invented).',
    value: {
      quantity: 'drop_threshold_height',
      variant: 'belt rubber',
      value: 400,
      samples: 20,
      method: 'Single drops onto the grading-line belt (demo trial)',
      ripeness: 'Softening',
      observation: 'no-bruise',
      note: DEMO_NOTE,
    },
  },
];

const insertedId = (row: unknown) =>
  typeof row === 'object' ? Number((row as { id: number }).id) : Number(row);

async function userId(trx: Knex.Transaction, email: string): Promise<number> {
  const user = await trx('users').where({ email }).first();
  if (!user) throw new Error(`demo revisions: no user ${email}`);
  return Number(user.id);
}

/** The demo value in the stored shape, checked with the same rules as an editor's form. */
function demoValue(demo: DemoRevision) {
  const parsed = revisionValueSchema.safeParse({ ...demo.value, sourceKey: DEMO_SOURCE.key });
  if (!parsed.success) {
    throw new Error(`demo value ${demo.cultivar}: ${parsed.error.issues.map((i) => i.message)}`);
  }
  return parsed.data;
}

async function insertDemo(trx: Knex.Transaction, demo: DemoRevision, sourceId: number) {
  const cultivar = await trx('cultivars').where({ slug: demo.cultivar }).first();
  if (!cultivar?.published_revision_id) return; // the catalogue changed: nothing to base it on
  const base = Number(cultivar.published_revision_id);
  const [{ max }] = await trx('property_revisions')
    .where({ cultivar_id: cultivar.id })
    .max({ max: 'number' });
  const now = new Date();
  const [row] = await trx('property_revisions')
    .insert({
      cultivar_id: cultivar.id,
      number: Number(max ?? 0) + 1,
      status: demo.status,
      author_id: await userId(trx, demo.author),
      reviewer_id: demo.reviewer ? await userId(trx, demo.reviewer) : null,
      review_comment: demo.reviewComment ?? null,
      based_on_id: base,
      summary: demo.summary,
      is_demo: true,
      created_at: now,
      updated_at: now,
      submitted_at: now,
      reviewed_at: demo.reviewer ? now : null,
    })
    .returning('id');
  const revisionId = insertedId(row);
  const copied = await trx('revision_values').where({ revision_id: base }).orderBy('position');
  await trx('revision_values').insert([
    ...copied.map((v) => {
      const copy = { ...v, revision_id: revisionId };
      delete copy.id;
      return copy;
    }),
    valueRow(demoValue(demo), revisionId, copied.length, sourceId),
  ]);
}

export async function seed(knex: Knex): Promise<void> {
  if (await knex('property_revisions').where({ is_demo: true }).first()) return;
  await knex.transaction(async (trx) => {
    const existing = await trx('sources').where({ key: DEMO_SOURCE.key }).first();
    const sourceId = existing
      ? Number(existing.id)
      : insertedId(
          (
            await trx('sources')
              .insert({ ...DEMO_SOURCE, created_at: new Date() })
              .returning('id')
          )[0],
        );
    for (const demo of DEMO_REVISIONS) await insertDemo(trx, demo, sourceId);
  });
}
