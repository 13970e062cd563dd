import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { can, invitableRoles, type Role } from '@/lib/auth/roles';
import { ConflictError, ForbiddenError, NotFoundError } from '@/lib/errors';
import { recordAudit } from '@/lib/audit-trail';
import { toIso } from '@/lib/db-values';
import { mailInvitation, newToken } from './invitation-mail';
import {
  assertUnderHourlyLimit,
  canManage,
  insertInvitation,
  markReplaced,
  roleOf,
  stateOf,
  whereOpen,
  type InvitationRecord,
} from './invitation-rules';

export interface OpenInvitation {
  id: number;
  email: string;
  role: Role;
  inviter: { name: string; email: string };
  createdAt: string;
  expiresAt: string;
  expired: boolean;
}

/**
 * Open invitations the actor may manage, newest first: all of them for a role that may invite
 * any role, otherwise the ones the actor sent with a role it may hand out.
 */
export async function listOpenInvitations(actor: Actor, now = new Date()) {
  assertCan(actor, 'invitations:create-buyer');
  const query = whereOpen(db('invitations as i'), 'i')
    .join('users as u', 'u.id', 'i.invited_by')
    .select('i.*', 'u.name as inviter_name', 'u.email as inviter_email')
    .orderBy('i.created_at', 'desc')
    .orderBy('i.id', 'desc');
  if (!can(actor.role, 'invitations:create-any')) {
    query.where('i.invited_by', actor.id).whereIn('i.role', invitableRoles(actor.role));
  }
  const rows: (InvitationRecord & { inviter_name: string; inviter_email: string })[] = await query;
  return rows.map((r): OpenInvitation => ({
    id: r.id,
    email: r.email,
    role: roleOf(r),
    inviter: { name: r.inviter_name, email: r.inviter_email },
    createdAt: toIso(r.created_at),
    expiresAt: toIso(r.expires_at),
    expired: stateOf(r, now) === 'expired',
  }));
}

/** The invitation, locked for this transaction, if the actor may change it and it is open. */
async function openInvitationFor(trx: Knex.Transaction, actor: Actor, id: number) {
  const row: InvitationRecord | undefined = await trx('invitations')
    .where({ id })
    .forUpdate()
    .first();
  if (!row) throw new NotFoundError('No such invitation.');
  if (!canManage(actor, row)) {
    throw new ForbiddenError(
      `The ${actor.role} role may change only the ${invitableRoles(actor.role).join(', ')} invitations it sent.`,
    );
  }
  const state = stateOf(row);
  if (state === 'used' || state === 'revoked' || state === 'replaced') {
    throw new ConflictError(`This invitation was already ${state}; there is nothing to change.`);
  }
  return { ...row, role: roleOf(row) };
}

/** Withdraw an open invitation: its link stops working and says it was withdrawn. */
export async function revokeInvitation(actor: Actor, id: number) {
  assertCan(actor, 'invitations:create-buyer');
  return db.transaction(async (trx) => {
    const row = await openInvitationFor(trx, actor, id);
    await whereOpen(trx('invitations').where({ id })).update({
      revoked_at: new Date(),
      revoked_by: actor.id,
    });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'invitation.revoke',
      entity: 'invitation',
      entityId: id,
      detail: { email: row.email, role: row.role },
    });
    return { id, email: row.email, role: row.role, state: 'revoked' as const };
  });
}

/**
 * Send an open (or expired) invitation again with a new token and a new 7-day expiry; the old
 * link then says it was replaced. Counts towards the sender's hourly limit, like any invitation.
 */
export async function resendInvitation(actor: Actor, id: number) {
  assertCan(actor, 'invitations:create-buyer');
  const { token, tokenHash } = newToken();
  const now = new Date();
  const sent = await db.transaction(async (trx) => {
    await assertUnderHourlyLimit(trx, actor.id, now);
    const old = await openInvitationFor(trx, actor, id);
    if (await trx('users').where({ email: old.email }).first()) {
      throw new ConflictError('An account with this e-mail already exists.');
    }
    const { email, role } = old;
    const row = await insertInvitation(trx, { email, role, tokenHash, invitedBy: actor.id, now });
    await markReplaced(trx, [id], row.id, now);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'invitation.resend',
      entity: 'invitation',
      entityId: row.id,
      detail: { email, role, replaced: id },
    });
    return { id: row.id, email, role, expiresAt: row.expiresAt, replaced: id };
  });
  await mailInvitation(
    { to: sent.email, role: sent.role, inviterName: actor.name, token, expiresAt: sent.expiresAt },
    'A new link was saved but the e-mail could not be sent. Check the mail settings and resend it.',
  );
  return sent;
}
