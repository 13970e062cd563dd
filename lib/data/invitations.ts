import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { hashPassword } from '@/lib/auth/password';
import { invitableRoles, isRole, type Role } from '@/lib/auth/roles';
import { AppError, ConflictError, ForbiddenError, ValidationError } from '@/lib/errors';
import { appUrl, sendMail } from '@/lib/mail/send';
import { parseInput } from '@/lib/validation/parse';
import { acceptInvitationSchema, invitationSchema } from '@/lib/validation/users';
import { recordAudit } from './audit';
import { insertUser } from './users';

export const INVITATION_DAYS = 7;

function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export type InvitationState =
  | { state: 'valid'; id: number; email: string; role: Role; expiresAt: Date }
  | { state: 'invalid' | 'used' | 'expired' };

/** Invite someone by e-mail with a one-time link; editors may invite buyers only. */
export async function createInvitation(actor: Actor, input: unknown) {
  assertCan(actor, 'invitations:create-buyer');
  const { email, role } = parseInput(invitationSchema, input);
  if (!invitableRoles(actor.role).includes(role)) {
    throw new ForbiddenError(
      `The ${actor.role} role may invite ${invitableRoles(actor.role).join(', ')} only.`,
    );
  }
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + INVITATION_DAYS * 24 * 3600 * 1000);
  const id = await db.transaction(async (trx) => {
    if (await trx('users').where({ email }).first()) {
      throw new ConflictError('An account with this e-mail already exists.');
    }
    const [row] = await trx('invitations')
      .insert({
        email,
        role,
        token_hash: hashToken(token),
        invited_by: actor.id,
        expires_at: expiresAt,
        created_at: new Date(),
      })
      .returning('id');
    const newId = typeof row === 'object' ? Number(row.id) : Number(row);
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'invitation.create',
      entity: 'invitation',
      entityId: newId,
      detail: { email, role },
    });
    return newId;
  });
  const link = `${appUrl()}/invite/${token}`;
  try {
    await sendMail({
      to: email,
      subject: 'Your invitation to Tenderline',
      text: [
        `${actor.name} has invited you to Tenderline as ${role === 'buyer' ? 'a buyer' : `an ${role}`}.`,
        '',
        `Open this link to choose your name and password (it works once, until ${expiresAt.toUTCString()}):`,
        link,
        '',
        'If you did not expect this message, you can ignore it.',
      ].join('\n'),
    });
  } catch {
    throw new AppError(
      502,
      'mail_failed',
      'The invitation was saved but the e-mail could not be sent. Check the mail settings and invite again.',
    );
  }
  return { id, email, role, expiresAt };
}

/** What a link's token stands for, without revealing why a bad token is bad beyond used/expired. */
export async function getInvitationState(
  token: string,
  now = new Date(),
): Promise<InvitationState> {
  if (typeof token !== 'string' || !/^[A-Za-z0-9_-]{20,100}$/.test(token))
    return { state: 'invalid' };
  const row = await db('invitations')
    .where({ token_hash: hashToken(token) })
    .first();
  if (!row || !isRole(row.role)) return { state: 'invalid' };
  if (row.accepted_at) return { state: 'used' };
  const expiresAt = new Date(row.expires_at);
  if (expiresAt.getTime() <= now.getTime()) return { state: 'expired' };
  return { state: 'valid', id: row.id, email: row.email, role: row.role, expiresAt };
}

/** Accept an invitation: creates the account and spends the token in one transaction. */
export async function acceptInvitation(
  token: string,
  input: unknown,
): Promise<{ userId: number; email: string }> {
  const values = parseInput(acceptInvitationSchema, input);
  const passwordHash = await hashPassword(values.password);
  return db.transaction(async (trx) => {
    const row = await trx('invitations')
      .where({ token_hash: hashToken(String(token)) })
      .first();
    if (!row) throw new ValidationError('This invitation link is not valid.');
    if (row.accepted_at) throw new ConflictError('This invitation has already been used.');
    if (new Date(row.expires_at).getTime() <= Date.now())
      throw new ValidationError('This invitation has expired.');
    const userId = await insertUser(trx, {
      email: row.email,
      name: values.name,
      role: row.role,
      passwordHash,
    });
    const spent = await trx('invitations')
      .where({ id: row.id })
      .whereNull('accepted_at')
      .update({ accepted_at: new Date(), accepted_user_id: userId });
    if (spent !== 1) throw new ConflictError('This invitation has already been used.');
    await recordAudit(trx, {
      actorId: userId,
      action: 'invitation.accept',
      entity: 'invitation',
      entityId: row.id,
    });
    return { userId, email: row.email };
  });
}
