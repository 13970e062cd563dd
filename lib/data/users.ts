import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { hashPassword, spendVerifyTime, verifyPassword } from '@/lib/auth/password';
import { isRole, type Role } from '@/lib/auth/roles';
import { ConflictError, NotFoundError, ValidationError } from '@/lib/errors';
import { parseInput } from '@/lib/validation/parse';
import { changePasswordSchema, userUpdateSchema } from '@/lib/validation/users';
import { recordAudit } from './audit';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  created_at: string;
}

interface UserRecord extends UserRow {
  password_hash: string;
}

function toRow(r: Record<string, unknown>): UserRow {
  return {
    id: Number(r.id),
    email: String(r.email),
    name: String(r.name),
    role: isRole(r.role) ? r.role : 'buyer',
    disabled: Boolean(r.disabled),
    created_at: new Date(r.created_at as string | number).toISOString(),
  };
}

/** An enabled user by id, as an Actor, or null (unknown or disabled). */
export async function getActiveActor(id: number): Promise<Actor | null> {
  const r = await db('users').where({ id }).first();
  if (!r || r.disabled || !isRole(r.role)) return null;
  return { id: r.id, email: r.email, name: r.name, role: r.role };
}

/** Credentials check for sign-in: the enabled user with this e-mail and password, else null. */
export async function verifyCredentials(email: string, password: string): Promise<Actor | null> {
  const r = (await db('users').where({ email: email.toLowerCase() }).first()) as
    UserRecord | undefined;
  if (!r) {
    await spendVerifyTime(password);
    return null;
  }
  const ok = await verifyPassword(password, r.password_hash);
  if (!ok || r.disabled || !isRole(r.role)) return null;
  return { id: r.id, email: r.email, name: r.name, role: r.role };
}

export async function listUsers(actor: Actor): Promise<UserRow[]> {
  assertCan(actor, 'users:manage');
  const rows = await db('users')
    .select('id', 'email', 'name', 'role', 'disabled', 'created_at')
    .orderBy('email');
  return rows.map(toRow);
}

/** Change another user's role or disabled flag. Admins may not lock themselves out. */
export async function updateUser(actor: Actor, userId: number, input: unknown): Promise<UserRow> {
  assertCan(actor, 'users:manage');
  const change = parseInput(userUpdateSchema, input);
  return db.transaction(async (trx) => {
    const before = await trx('users').where({ id: userId }).first();
    if (!before) throw new NotFoundError('No such user.');
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
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'user.update',
      entity: 'user',
      entityId: userId,
      detail: { before: { role: before.role, disabled: Boolean(before.disabled) }, change },
    });
    return toRow(await trx('users').where({ id: userId }).first());
  });
}

/** Change one's own password after checking the current one. */
export async function changeOwnPassword(actor: Actor, input: unknown): Promise<void> {
  const change = parseInput(changePasswordSchema, input);
  const r = (await db('users').where({ id: actor.id }).first()) as UserRecord | undefined;
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
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'user.password',
      entity: 'user',
      entityId: actor.id,
    });
  });
}

/** Create a user inside an existing transaction (invitation acceptance); hash the password first. */
export async function insertUser(
  trx: import('knex').Knex.Transaction,
  user: { email: string; name: string; role: Role; passwordHash: string },
): Promise<number> {
  const existing = await trx('users').where({ email: user.email.toLowerCase() }).first();
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
  return typeof row === 'object' ? Number(row.id) : Number(row);
}
