import knex, { type Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '@/knexfile';
import { DEMO_USERS } from '@/seeds/01_users';

const TABLES = ['users', 'sign_in_limits', 'invitations', 'mail_outbox', 'audit_log'];

describe('migrations on a fresh database', () => {
  let db: Knex;
  beforeAll(() => {
    // Its own in-memory database (pool of one), separate from the app's test connection.
    db = knex({ ...config.test, connection: { filename: ':memory:' } });
  });
  afterAll(() => db.destroy());

  it('go up, seed, and come down again leaving nothing behind', async () => {
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
    expect(await db('users').count({ n: '*' })).toEqual([{ n: DEMO_USERS.length }]);

    await db.migrate.rollback(undefined, true);
    for (const t of TABLES) expect(await db.schema.hasTable(t), t).toBe(false);
    await db.migrate.latest();
    expect(await db.schema.hasTable('users')).toBe(true);
  });

  it('enforces one account per e-mail', async () => {
    const row = { email: 'dup@kestrelvale.example', name: 'A', password_hash: 'x', role: 'buyer' };
    await db('users').insert(row);
    await expect(db('users').insert({ ...row, name: 'B' })).rejects.toThrow(/UNIQUE/);
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
    ).rejects.toThrow(/FOREIGN KEY/);
  });
});
