import { createHash, randomBytes } from 'node:crypto';
import { db } from '@/lib/db';
import type { Role } from '@/lib/auth/roles';

let n = 0;

/**
 * An open invitation written straight to the database, with its token, for tests that need many
 * of them. Created two hours ago by default so fixtures do not count towards the hourly limit.
 */
export async function seedInvitation(
  invitedBy: number,
  role: Role = 'buyer',
  options: { email?: string; createdAt?: Date; expiresAt?: Date } = {},
) {
  const token = randomBytes(32).toString('base64url');
  const createdAt = options.createdAt ?? new Date(Date.now() - 2 * 3600e3);
  const email = options.email ?? `fixture-${++n}-${randomBytes(3).toString('hex')}@guest.example`;
  const [row] = await db('invitations')
    .insert({
      email,
      role,
      token_hash: createHash('sha256').update(token).digest('hex'),
      invited_by: invitedBy,
      expires_at: options.expiresAt ?? new Date(createdAt.getTime() + 7 * 24 * 3600e3),
      created_at: createdAt,
    })
    .returning('id');
  const id = typeof row === 'object' ? Number(row.id) : Number(row);
  return { id, token, email };
}

export async function invitationRow(id: number) {
  return db('invitations').where({ id }).first();
}

export async function auditActions(entityId?: number): Promise<string[]> {
  const query = db('audit_log').where({ entity: 'invitation' }).orderBy('id');
  if (entityId !== undefined) query.where({ entity_id: String(entityId) });
  return (await query.select('action')).map((r) => r.action);
}
