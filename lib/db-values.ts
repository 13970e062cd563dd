import type { BigIntColumn, Bool, Timestamp } from './db-schema';

// The few values better-sqlite3 and pg return differently (see lib/db-schema.ts), made one.

/** A timestamp column as a Date: a pg Date as is, SQLite epoch ms or text through `new Date`. */
export function toDate(value: Timestamp): Date {
  return value instanceof Date ? value : new Date(value);
}

/** A timestamp column as the ISO text the pages and the API show. */
export function toIso(value: Timestamp): string {
  return toDate(value).toISOString();
}

export function toIsoOrNull(value: Timestamp | null): string | null {
  return value == null ? null : toIso(value);
}

/** A boolean column: SQLite's 0/1 or pg's boolean. */
export function toBool(value: Bool): boolean {
  return value === true || value === 1;
}

/** A count or a bigint: pg returns 64-bit integers as text. */
export function toCount(value: BigIntColumn | bigint | null | undefined): number {
  return Number(value ?? 0);
}

/**
 * The id of an inserted row from knex's `.insert(…).returning('id')`: pg gives `{ id }`,
 * better-sqlite3 the same, older SQLite drivers the bare number.
 */
export function insertedId(row: { id: number } | number): number {
  return typeof row === 'object' ? Number(row.id) : Number(row);
}

/** A unique-constraint refusal from SQLite or PostgreSQL (a racing writer took the key first). */
export function isUniqueViolation(error: unknown): boolean {
  const e = error as { code?: string; message?: string } | null;
  return (
    e?.code === '23505' ||
    e?.code === 'SQLITE_CONSTRAINT_UNIQUE' ||
    /UNIQUE constraint failed/.test(e?.message ?? '')
  );
}
