import fs from 'node:fs';
import path from 'node:path';
import type { Knex } from 'knex';

// Paths are relative to the project root: the app, the knex CLI and the tests all run from there.
const root = process.cwd();
const sqliteFile = process.env.DATABASE_FILE ?? path.join(root, 'data', 'tenderline.sqlite');
if (sqliteFile !== ':memory:') fs.mkdirSync(path.dirname(sqliteFile), { recursive: true });

const shared = {
  migrations: { directory: path.join(root, 'migrations'), loadExtensions: ['.ts'] },
  seeds: { directory: path.join(root, 'seeds'), loadExtensions: ['.ts'] },
};

/**
 * The app and the mail catcher are separate connections to one file: write-ahead logging lets
 * readers run beside a writer, and a busy timeout makes a second writer wait instead of failing.
 */
function walMode(conn: { pragma: (sql: string) => unknown }, done: (err: Error | null) => void) {
  try {
    conn.pragma('journal_mode = WAL');
    conn.pragma('busy_timeout = 5000');
    done(null);
  } catch (error) {
    done(error as Error);
  }
}

/**
 * development: a SQLite file under data/ (or DATABASE_FILE);
 * test: a throw-away SQLite database (DATABASE_FILE, else in memory with a pool of one);
 * production: PostgreSQL from DATABASE_URL, same migrations.
 */
const config: Record<'development' | 'test' | 'production', Knex.Config> = {
  development: {
    client: 'better-sqlite3',
    connection: { filename: sqliteFile },
    useNullAsDefault: true,
    pool: { min: 1, max: 1, afterCreate: walMode },
    ...shared,
  },
  test: {
    client: 'better-sqlite3',
    connection: { filename: process.env.DATABASE_FILE ?? ':memory:' },
    useNullAsDefault: true,
    pool: { min: 1, max: 1 },
    ...shared,
  },
  production: {
    client: 'pg',
    connection: process.env.DATABASE_URL,
    pool: { min: 1, max: 10 },
    ...shared,
  },
};

/** KNEX_ENV picks the config; otherwise PostgreSQL when DATABASE_URL is set, else the SQLite file. */
export function knexEnvironment(): keyof typeof config {
  const env = process.env.KNEX_ENV;
  if (env === 'development' || env === 'test' || env === 'production') return env;
  return process.env.DATABASE_URL ? 'production' : 'development';
}

export { config };
export default config[knexEnvironment()];
