import 'server-only';
import { isUnitSystem, type UnitSystem } from '@/lib/units';
import type { Knex } from 'knex';
import type { Selectable } from 'kysely';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import type { UsersTable } from '@/lib/db-schema';
import { insertedId, toBool, toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { isRole, type Role } from '@/lib/auth/roles';
import { ConflictError, NotFoundError, ValidationError } from '@/lib/errors';
import { parseInput } from '@/lib/validation/parse';
import { changePasswordSchema, unitSystemSchema, userUpdateSchema } from '@/lib/validation/users';
import { endUserSessions } from '@/lib/auth/session-store';
import { clearAccountLimits, listAccountLocks, type AccountLock } from '@/lib/auth/sign-in-limits';
import { recordAudit } from '@/lib/audit-trail';

// Tests and server-side jobs acting as a user take their actor here with the rest of the user
// data; the lookups themselves live in lib/auth/accounts.ts, below lib/data.
export { getActiveActor, verifyCredentials } from '@/lib/auth/accounts';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  created_at: string;
}

const USER_COLUMNS = ['id', 'email', 'name', 'role', 'disabled', 'created_at'] as const;

/** A typed users row as pages and routes show it (no password hash). */
function toRow(r: Pick<Selectable<UsersTable>, (typeof USER_COLUMNS)[number]>): UserRow {
  return {
    id: r.id,
    email: r.email,
    name: r.name,
    role: isRole(r.role) ? r.role : 'buyer',
    disabled: toBool(r.disabled),
    created_at: toIso(r.created_at),
  };
}

/** One user's row in a transaction (typed), or a 404. */
async function userRow(trx: Knex.Transaction, id: number) {
  const row = await typed(trx)
    .selectFrom('users')
    .select(USER_COLUMNS)
    .where('id', '=', id)
    .executeTakeFirst();
  if (!row) throw new NotFoundError('No such user.');
  return row;
}

/** Sign a user out on every device ("Sign out everywhere"): their session rows go. */
export async function endAllSessions(userId: number, reason: string): Promise<void> {
  await db.transaction(async (trx) => {
    await endUserSessions(trx, userId);
    await recordAudit(trx, {
      actorId: userId,
      action: 'session.end-all',
      entity: 'user',
      entityId: userId,
      detail: { reason },
    });
  });
}

export async function listUsers(actor: Actor): Promise<UserRow[]> {
  assertCan(actor, 'users:manage');
  const rows = await typed().selectFrom('users').select(USER_COLUMNS).orderBy('email').execute();
  return rows.map(toRow);
}

/** Change another user's role or disabled flag. Admins may not lock themselves out. */
export async function updateUser(actor: Actor, userId: number, input: unknown): Promise<UserRow> {
  assertCan(actor, 'users:manage');
  const change = parseInput(userUpdateSchema, input);
  return db.transaction(async (trx) => {
    const before = await userRow(trx, userId);
    if (
      before.id === actor.id &&
      (change.disabled === true || (change.role && change.role !== 'admin'))
    ) {
      throw new ValidationError('You cannot disable yourself or drop your own admin role.', {
        [change.disabled ? 'disabled' : 'role']: ['Ask another admin to make this change.'],
      });
    }
    const patch: Record<string, unknown> = { updated_at: new Date() };
    if (change.role) patch.role = change.role;
    if (change.disabled !== undefined) patch.disabled = change.disabled;
    await trx('users').where({ id: userId }).update(patch);
    // A disabled account or a changed role starts from a fresh sign-in everywhere.
    await endUserSessions(trx, userId);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'user.update',
      entity: 'user',
      entityId: userId,
      detail: { before: { role: before.role, disabled: toBool(before.disabled) }, change },
    });
    return toRow(await userRow(trx, userId));
  });
}

/** Change one's own password after checking the current one. */
export async function changeOwnPassword(actor: Actor, input: unknown): Promise<void> {
  const change = parseInput(changePasswordSchema, input);
  const r = await typed()
    .selectFrom('users')
    .select('password_hash')
    .where('id', '=', actor.id)
    .executeTakeFirst();
  if (!r) throw new NotFoundError('No such user.');
  if (!(await verifyPassword(change.currentPassword, r.password_hash))) {
    throw new ValidationError('The current password is not right.', {
      currentPassword: ['The current password is not right.'],
    });
  }
  const hash = await hashPassword(change.newPassword);
  await db.transaction(async (trx) => {
    await trx('users')
      .where({ id: actor.id })
      .update({ password_hash: hash, updated_at: new Date() });
    // Every session, this one included, must sign in again with the new password.
    await endUserSessions(trx, actor.id);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'user.password',
      entity: 'user',
      entityId: actor.id,
    });
  });
}

/** Admin: the accounts with a sign-in lock now, matched to their users. */
export async function listSignInLocks(actor: Actor): Promise<(AccountLock & { userId: number })[]> {
  assertCan(actor, 'users:manage');
  const locks = await listAccountLocks();
  if (!locks.length) return [];
  const rows = await typed()
    .selectFrom('users')
    .select(['id', 'email'])
    .where('email', 'in', [...new Set(locks.map((l) => l.email))])
    .execute();
  const ids = new Map(rows.map((r) => [r.email, r.id]));
  return locks.flatMap((l) => (ids.has(l.email) ? [{ ...l, userId: ids.get(l.email)! }] : []));
}

/** Admin: clear an account's sign-in lock (every address and the account-wide count). */
export async function clearSignInLock(actor: Actor, userId: number): Promise<number> {
  assertCan(actor, 'users:manage');
  return db.transaction(async (trx) => {
    const user = await userRow(trx, userId);
    const cleared = await clearAccountLimits(trx, user.email);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'sign-in.unlock',
      entity: 'user',
      entityId: userId,
      detail: { email: user.email, cleared },
    });
    return cleared;
  });
}

/** Create a user inside an existing transaction (invitation acceptance); hash the password first. */
export async function insertUser(
  trx: Knex.Transaction,
  user: { email: string; name: string; role: Role; passwordHash: string },
): Promise<number> {
  const existing = await typed(trx)
    .selectFrom('users')
    .select('id')
    .where('email', '=', user.email.toLowerCase())
    .executeTakeFirst();
  if (existing) throw new ConflictError('An account with this e-mail already exists.');
  const [row] = await trx('users')
    .insert({
      email: user.email.toLowerCase(),
      name: user.name,
      role: user.role,
      password_hash: user.passwordHash,
      disabled: false,
      created_at: new Date(),
      updated_at: new Date(),
    })
    .returning('id');
  return insertedId(row);
}

/** The user's display units (SI unless they chose US customary). */
export async function getUnitSystem(actor: Actor): Promise<UnitSystem> {
  const row = await typed()
    .selectFrom('users')
    .select('unit_system')
    .where('id', '=', actor.id)
    .executeTakeFirst();
  return row && isUnitSystem(row.unit_system) ? row.unit_system : 'si';
}

/** Choose one's own display units: `{ unitSystem: 'si' | 'us' }`. */
export async function setUnitSystem(actor: Actor, input: unknown): Promise<UnitSystem> {
  assertCan(actor, 'account:manage-own');
  const { unitSystem } = parseInput(unitSystemSchema, input);
  await db.transaction(async (trx) => {
    await trx('users')
      .where({ id: actor.id })
      .update({ unit_system: unitSystem, updated_at: new Date() });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'user.units',
      entity: 'user',
      entityId: actor.id,
      detail: { unitSystem },
    });
  });
  return unitSystem;
}
