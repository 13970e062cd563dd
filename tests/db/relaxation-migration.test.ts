import knex, { type Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '@/knexfile';

const MIGRATION = '20261206000100_relaxation_tests.ts';

describe('the relaxation_tests migration', () => {
  let db: Knex;
  beforeAll(async () => {
    // Its own database, as tests/db/migrations.test.ts: SQLite in memory, or the PostgreSQL leg's.
    db = process.env.TEST_DATABASE_URL
      ? knex({ ...config.production, connection: process.env.TEST_DATABASE_URL })
      : knex({ ...config.test, connection: { filename: ':memory:' } });
    await db.migrate.rollback(undefined, true);
    await db.migrate.latest();
    await db.seed.run();
  });
  afterAll(() => db.destroy());

  const row = async () => ({
    cultivar_id: (await db('cultivars').orderBy('id').first()).id,
    uploaded_by: (await db('users').orderBy('id').first()).id,
    storage_key: 'relaxation-tests/1/x.csv',
    file_name: 'x.csv',
    rows: 241,
    deformation_mm: 5,
    specimen: 'whole fruit between flat plates',
    f0_n: 30,
    k1_s: 8,
    k2: 1.6,
    r2_linear: 1,
    r2_force: 1,
  });

  it('takes a test, with the optional columns empty and is_demo false by default', async () => {
    const [inserted] = await db('relaxation_tests')
      .insert(await row())
      .returning('id');
    const id = typeof inserted === 'object' ? inserted.id : inserted;
    const stored = await db('relaxation_tests').where({ id }).first();
    expect([stored.loading_rate, stored.temperature_c, stored.draft_revision_id]).toEqual([
      null,
      null,
      null,
    ]);
    expect(Boolean(stored.is_demo)).toBe(false);
    expect(stored.created_at).not.toBeNull();
  });

  it('refuses a test without its held travel or specimen, or of an unknown cultivar', async () => {
    const noTravel: Partial<Awaited<ReturnType<typeof row>>> = await row();
    delete noTravel.deformation_mm;
    const noSpecimen: Partial<Awaited<ReturnType<typeof row>>> = await row();
    delete noSpecimen.specimen;
    await expect(db('relaxation_tests').insert(noTravel)).rejects.toThrow(/NOT NULL|null value/);
    await expect(db('relaxation_tests').insert(noSpecimen)).rejects.toThrow(/NOT NULL|null value/);
    await expect(
      db('relaxation_tests').insert({ ...(await row()), cultivar_id: 99999 }),
    ).rejects.toThrow(/FOREIGN KEY|foreign key constraint/);
  });

  it('comes down again, and up again', async () => {
    await db.migrate.down({ name: MIGRATION });
    expect(await db.schema.hasTable('relaxation_tests')).toBe(false);
    await db.migrate.up({ name: MIGRATION });
    expect(await db.schema.hasTable('relaxation_tests')).toBe(true);
  });
});
