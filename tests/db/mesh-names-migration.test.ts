import knex, { type Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '@/knexfile';

// The mesh levels' renaming reaches saved assessments: an assessment saved with the former
// names (written out here as an older release stored it) reads the new ones after the
// migration, and the former ones again after its rollback.
describe('the mesh-level names migration', () => {
  let db: Knex;
  beforeAll(async () => {
    db = process.env.TEST_DATABASE_URL
      ? knex({ ...config.production, connection: process.env.TEST_DATABASE_URL })
      : knex({ ...config.test, connection: { filename: ':memory:' } });
    await db.migrate.rollback(undefined, true);
    await db.migrate.latest();
    await db.seed.run();
    await db.migrate.down(); // back to before the renaming
  });
  afterAll(() => db.destroy());

  it('renames the level in the inputs and the result, and back', async () => {
    const owner = (await db('users').orderBy('id').first()).id;
    const [inserted] = await db('assessments')
      .insert({
        owner_id: owner,
        check: 'squeeze',
        title: 'Saved before the renaming',
        inputs: JSON.stringify({ diameterMm: 70, mesh: 'fine' }),
        results: JSON.stringify({
          check: 'squeeze',
          model: { input: { level: 'normal' }, mesh: { level: 'normal' }, grip_mesh: null },
        }),
      })
      .returning('id');
    const id = typeof inserted === 'object' ? inserted.id : inserted;
    await db.migrate.up();
    const after = await db('assessments').where({ id }).first();
    expect(JSON.parse(after.inputs)).toEqual({ diameterMm: 70, mesh: 'dense' });
    expect(JSON.parse(after.results).model).toEqual({
      input: { level: 'balanced' },
      mesh: { level: 'balanced' },
      grip_mesh: null,
    });
    await db.migrate.down();
    const back = await db('assessments').where({ id }).first();
    expect(JSON.parse(back.inputs).mesh).toBe('fine');
    expect(JSON.parse(back.results).model.mesh.level).toBe('normal');
    await db.migrate.up();
  });
});
