// The app as the browser tests see it: a fresh SQLite file, migrated and seeded, a catcher, next start.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import knex from 'knex';

// One database and bucket folder per port, so two browser runs on different ports never share.
const port = Number(process.env.E2E_PORT ?? 3100);
const file = path.resolve(`data/e2e-${port}.sqlite`);
const bucketDir = `data/e2e-${port}-s3`;
fs.mkdirSync(path.dirname(file), { recursive: true });
for (const suffix of ['', '-wal', '-shm']) fs.rmSync(file + suffix, { force: true });
fs.rmSync(bucketDir, { recursive: true, force: true });
process.env.KNEX_ENV = 'development';
process.env.DATABASE_FILE = file;

const { config } = await import('../knexfile');
const db = knex(config.development);
await db.migrate.latest();
await db.seed.run();
await db.destroy();

const { serve } = await import('./serve');
await serve({
  appUrl: `http://127.0.0.1:${port}`,
  smtpPort: 0,
  bucket: { port: 0, directory: bucketDir },
  env: {
    KNEX_ENV: 'development',
    DATABASE_FILE: file,
    NEXTAUTH_SECRET: randomBytes(32).toString('base64url'),
  },
});
