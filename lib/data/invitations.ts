import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { hashPassword } from '@/lib/auth/password';
import { invitableRoles, isRole, type Role } from '@/lib/auth/roles';
import { ConflictError, ForbiddenError, GoneError, ValidationError } from '@/lib/errors';
import { PROBLEM_MESSAGES, type InvitationProblem } from '@/lib/invitations/messages';
import { invitationTokenSchema, TOKEN_PATTERN } from '@/lib/validation/invitations';
import { parseInput } from '@/lib/validation/parse';
import { acceptInvitationSchema, invitationSchema } from '@/lib/validation/users';
import { recordAudit } from '@/lib/audit-trail';
import { toDate } from '@/lib/db-values';
import { hashToken, mailInvitation, newToken } from './invitation-mail';
import {
  assertUnderHourlyLimit,
  canManage,
  insertInvitation,
  markReplaced,
  stateOf,
  whereOpen,
  type InvitationRecord,
} from './invitation-rules';
import { insertUser } from './users';

export { INVITATION_DAYS, INVITATIONS_PER_HOUR } from './invitation-rules';

export type InvitationState =
  | { state: 'valid'; id: number; email: string; role: Role; expiresAt: Date }
  | { state: InvitationProblem };

/**
 * Invite someone by e-mail with a one-time link; editors may invite buyers only. An open
 * invitation to the same address is replaced (its link then says so), provided the inviter may
 * manage it; at most 20 invitations per inviter an hour.
 */
export async function createInvitation(actor: Actor, input: unknown) {
  assertCan(actor, 'invitations:create-buyer');
  const { email, role } = parseInput(invitationSchema, input);
  if (!invitableRoles(actor.role).includes(role)) {
    throw new ForbiddenError(
      `The ${actor.role} role may invite ${invitableRoles(actor.role).join(', ')} only.`,
    );
  }
  const { token, tokenHash } = newToken();
  const now = new Date();
  const created = await db.transaction(async (trx) => {
    await assertUnderHourlyLimit(trx, actor.id, now);
    if (await trx('users').where({ email }).first()) {
      throw new ConflictError('An account with this e-mail already exists.');
    }
    const open: InvitationRecord[] = await whereOpen(trx('invitations').where({ email }));
    if (open.some((row) => !canManage(actor, row))) {
      throw new ConflictError(
        'Someone else has already invited this address. Ask an admin to revoke that invitation first.',
      );
    }
    const replaced = open.map((row) => row.id);
    const row = await insertInvitation(trx, { email, role, tokenHash, invitedBy: actor.id, now });
    await markReplaced(trx, replaced, row.id, now);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'invitation.create',
      entity: 'invitation',
      entityId: row.id,
      detail: replaced.length ? { email, role, replaced } : { email, role },
    });
    return { ...row, replaced };
  });
  await mailInvitation(
    { to: email, role, inviterName: actor.name, token, expiresAt: created.expiresAt },
    'The invitation was saved but the e-mail could not be sent. Check the mail settings and resend it from the pending list.',
  );
  return { id: created.id, email, role, expiresAt: created.expiresAt, replaced: created.replaced };
}

/** What a link's token stands for; a malformed or unknown token is simply 'invalid'. */
export async function getInvitationState(
  token: string,
  now = new Date(),
): Promise<InvitationState> {
  if (typeof token !== 'string' || !TOKEN_PATTERN.test(token)) return { state: 'invalid' };
  const row: InvitationRecord | undefined = await db('invitations')
    .where({ token_hash: hashToken(token) })
    .first();
  if (!row || !isRole(row.role)) return { state: 'invalid' };
  const state = stateOf(row, now);
  if (state !== 'pending') return { state };
  const expiresAt = toDate(row.expires_at);
  return { state: 'valid', id: row.id, email: row.email, role: row.role, expiresAt };
}

/**
 * Accept an invitation: creates the account and spends the token in one transaction. An unknown
 * token is a 400 on the token field; a used, revoked, replaced or expired one is 410.
 */
export async function acceptInvitation(
  token: unknown,
  input: unknown,
): Promise<{ userId: number; email: string }> {
  const link = parseInput(invitationTokenSchema, { token });
  const values = parseInput(acceptInvitationSchema, input);
  const passwordHash = await hashPassword(values.password);
  return db.transaction(async (trx) => {
    const row: InvitationRecord | undefined = await trx('invitations')
      .where({ token_hash: hashToken(link.token) })
      .first();
    if (!row || !isRole(row.role)) {
      throw new ValidationError(PROBLEM_MESSAGES.invalid, { token: [PROBLEM_MESSAGES.invalid] });
    }
    const state = stateOf(row);
    if (state !== 'pending') throw new GoneError(PROBLEM_MESSAGES[state]);
    const userId = await insertUser(trx, {
      email: row.email,
      name: values.name,
      role: row.role,
      passwordHash,
    });
    const spent = await whereOpen(trx('invitations').where({ id: row.id })).update({
      accepted_at: new Date(),
      accepted_user_id: userId,
    });
    if (spent !== 1) throw new ConflictError(PROBLEM_MESSAGES.used);
    await recordAudit(trx, {
      actorId: userId,
      action: 'invitation.accept',
      entity: 'invitation',
      entityId: row.id,
    });
    return { userId, email: row.email };
  });
}
