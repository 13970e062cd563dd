import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';

export interface AuditRow {
  id: number;
  actor: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  detail: string | null;
  createdAt: string;
}

/** The newest audit entries first; admins only. */
export async function listAudit(actor: Actor, limit = 200): Promise<AuditRow[]> {
  assertCan(actor, 'audit:read');
  const rows = await db('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .select('a.id', 'u.email', 'a.action', 'a.entity', 'a.entity_id', 'a.detail', 'a.created_at')
    .orderBy('a.id', 'desc')
    .limit(limit);
  return rows.map((r) => ({
    id: Number(r.id),
    actor: r.email ?? null,
    action: r.action,
    entity: r.entity,
    entityId: r.entity_id,
    detail: r.detail,
    createdAt: new Date(r.created_at).toISOString(),
  }));
}
