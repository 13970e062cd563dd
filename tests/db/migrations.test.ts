import knex, { type Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '@/knexfile';
import { DEMO_USERS } from '@/seeds/01_users';

const TABLES = [
  'users',
  'sign_in_limits',
  'invitations',
  'mail_outbox',
  'audit_log',
  'commodities',
  'sources',
  'cultivars',
  'property_revisions',
  'revision_values',
  'follows',
  'images',
  'compression_tests',
];

describe('migrations on a fresh database', () => {
  let db: Knex;
  beforeAll(() => {
    // Its own database, separate from the app's test connection: SQLite in memory (pool of one),
    // or the PostgreSQL test database on the PostgreSQL leg.
    db = process.env.TEST_DATABASE_URL
      ? knex({ ...config.production, connection: process.env.TEST_DATABASE_URL })
      : knex({ ...config.test, connection: { filename: ':memory:' } });
  });
  afterAll(() => db.destroy());

  it('go up, seed, and come down again leaving nothing behind', async () => {
    await db.migrate.rollback(undefined, true); // a shared PostgreSQL database may hold a schema
    await db.migrate.latest();
    for (const t of TABLES) expect(await db.schema.hasTable(t), t).toBe(true);

    await db.seed.run();
    const users = await db('users').select('email', 'role').orderBy('email');
    expect(users).toHaveLength(DEMO_USERS.length);
    expect(new Set(users.map((u) => u.role))).toEqual(
      new Set(['admin', 'editor', 'engineer', 'buyer']),
    );

    // Seeding twice is harmless (insert … on conflict ignore).
    await db.seed.run();
    expect(Number((await db('users').count({ n: '*' }))[0].n)).toBe(DEMO_USERS.length);

    // Rows that point at users must not stop the rollback (SQLite rebuilds tables to drop columns).
    const admin = await db('users').where({ email: 'admin@kestrelvale.example' }).first();
    await db('audit_log').insert({ actor_id: admin.id, action: 'test', entity: 'test' });
    await db.migrate.rollback(undefined, true);
    for (const t of TABLES) expect(await db.schema.hasTable(t), t).toBe(false);
    await db.migrate.latest();
    expect(await db.schema.hasTable('users')).toBe(true);
  });

  it('enforces one account per e-mail', async () => {
    const row = { email: 'dup@kestrelvale.example', name: 'A', password_hash: 'x', role: 'buyer' };
    await db('users').insert(row);
    await expect(db('users').insert({ ...row, name: 'B' })).rejects.toThrow(
      /UNIQUE|unique constraint/,
    );
  });

  it('enforces the invitation → inviter foreign key', async () => {
    await expect(
      db('invitations').insert({
        email: 'x@y.example',
        role: 'buyer',
        token_hash: 'a'.repeat(64),
        invited_by: 9999,
        expires_at: new Date(),
      }),
    ).rejects.toThrow(/FOREIGN KEY|foreign key constraint/);
  });
});
