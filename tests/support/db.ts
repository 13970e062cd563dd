import { db } from '@/lib/db';

/** A fresh schema with the demo seed, in this test process's in-memory database. */
export async function freshDatabase() {
  await db.migrate.rollback(undefined, true);
  await db.migrate.latest();
  await db.seed.run();
  return db;
}

export async function userId(email: string): Promise<number> {
  const row = await db('users').where({ email }).first();
  if (!row) throw new Error(`seed user ${email} missing`);
  return Number(row.id);
}

export async function countRows(table: string): Promise<number> {
  const [{ n }] = await db(table).count({ n: '*' });
  return Number(n);
}
