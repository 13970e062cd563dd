import 'server-only';
import knex, { type Knex } from 'knex';
import { config, knexEnvironment } from '@/knexfile';

const globalForDb = globalThis as unknown as { tenderlineDb?: Knex };

/** The one Knex instance of the server process (kept across hot reloads in development). */
export const db: Knex = globalForDb.tenderlineDb ?? knex(config[knexEnvironment()]);
if (process.env.NODE_ENV !== 'production') globalForDb.tenderlineDb = db;
