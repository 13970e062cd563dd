import 'server-only';
import type { Knex } from 'knex';
import type { Selectable } from 'kysely';
import type { InvitationsTable } from '@/lib/db-schema';
import { insertedId, toDate } from '@/lib/db-values';
import type { Actor } from '@/lib/auth/actor';
import { can, invitableRoles, isRole, type Role } from '@/lib/auth/roles';
import { RateLimitError } from '@/lib/errors';
import type { InvitationProblem } from '@/lib/invitations/messages';

export const INVITATION_DAYS = 7;
export const INVITATIONS_PER_HOUR = 20;
const HOUR_MS = 3600 * 1000;

/**
 * An invitations row as the drivers return it (lib/db-schema.ts). Its role is text: the readers
 * check it with isRole before handing it on as a Role.
 */
export type InvitationRecord = Selectable<InvitationsTable>;

/** The row's role; a role the app does not know is a broken row, not something to pass on. */
export function roleOf(row: Pick<InvitationRecord, 'id' | 'role'>): Role {
  if (!isRole(row.role)) throw new Error(`invitation ${row.id} has an unknown role`);
  return row.role;
}

/** Open means not used, revoked or replaced; an open invitation past its expiry is 'expired'. */
export function stateOf(row: InvitationRecord, now = new Date()): 'pending' | InvitationProblem {
  if (row.accepted_at) return 'used';
  if (row.revoked_at) return 'revoked';
  if (row.replaced_at) return 'replaced';
  if (toDate(row.expires_at).getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

/** Limits a query to open invitations (pending or expired, but not ended by anyone). */
export function whereOpen(query: Knex.QueryBuilder, alias = 'invitations'): Knex.QueryBuilder {
  return query
    .whereNull(`${alias}.accepted_at`)
    .whereNull(`${alias}.revoked_at`)
    .whereNull(`${alias}.replaced_at`);
}

/**
 * Who may revoke or resend an invitation: a role that may invite any role manages all of them;
 * a role that may invite buyers only manages the buyer invitations it sent itself.
 */
export function canManage(actor: Actor, row: Pick<InvitationRecord, 'invited_by' | 'role'>) {
  if (can(actor.role, 'invitations:create-any')) return true;
  return (
    can(actor.role, 'invitations:create-buyer') &&
    row.invited_by === actor.id &&
    isRole(row.role) &&
    invitableRoles(actor.role).includes(row.role)
  );
}

/**
 * Refuse a 21st invitation e-mail within an hour. Runs inside the transaction that inserts: the
 * inviter's row is locked first (FOR UPDATE on PostgreSQL; SQLite runs one writer at a time), so
 * parallel requests count one after another and cannot pass the limit together.
 */
export async function assertUnderHourlyLimit(trx: Knex.Transaction, inviterId: number, now: Date) {
  await trx('users').where({ id: inviterId }).forUpdate().first('id');
  const since = new Date(now.getTime() - HOUR_MS);
  const recent = await trx('invitations')
    .where({ invited_by: inviterId })
    .where('created_at', '>', since)
    .orderBy('created_at', 'asc')
    .select('created_at');
  if (recent.length < INVITATIONS_PER_HOUR) return;
  const freeAt =
    toDate(recent[recent.length - INVITATIONS_PER_HOUR].created_at).getTime() + HOUR_MS;
  const seconds = Math.max(1, Math.ceil((freeAt - now.getTime()) / 1000));
  throw new RateLimitError(
    `You have sent ${INVITATIONS_PER_HOUR} invitations in the last hour, the most allowed. ` +
      `Try again in ${Math.ceil(seconds / 60)} min.`,
    seconds,
  );
}

/** Insert one invitation row and return its id and expiry. */
export async function insertInvitation(
  trx: Knex.Transaction,
  values: { email: string; role: Role; tokenHash: string; invitedBy: number; now: Date },
): Promise<{ id: number; expiresAt: Date }> {
  const expiresAt = new Date(values.now.getTime() + INVITATION_DAYS * 24 * HOUR_MS);
  const [row] = await trx('invitations')
    .insert({
      email: values.email,
      role: values.role,
      token_hash: values.tokenHash,
      invited_by: values.invitedBy,
      expires_at: expiresAt,
      created_at: values.now,
    })
    .returning('id');
  return { id: insertedId(row), expiresAt };
}

/** Mark open invitations as replaced by a newer one; only rows still open are touched. */
export async function markReplaced(
  trx: Knex.Transaction,
  ids: number[],
  replacedBy: number,
  now: Date,
): Promise<void> {
  if (ids.length === 0) return;
  await whereOpen(trx('invitations').whereIn('id', ids)).update({
    replaced_at: now,
    replaced_by: replacedBy,
  });
}
