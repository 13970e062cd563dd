import 'server-only';
import { typed } from '@/lib/db-kysely';
import { toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';

export interface AuditRow {
  id: number;
  actor: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  /** The stored JSON text as the admin list shows it (lib/db-json.ts `auditDetail` parses it). */
  detail: string | null;
  createdAt: string;
}

/** The newest audit entries first; admins only. */
export async function listAudit(actor: Actor, limit = 200): Promise<AuditRow[]> {
  assertCan(actor, 'audit:read');
  const rows = await typed()
    .selectFrom('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .select(['a.id', 'u.email', 'a.action', 'a.entity', 'a.entity_id', 'a.detail', 'a.created_at'])
    .orderBy('a.id', 'desc')
    .limit(limit)
    .execute();
  return rows.map((r) => ({
    id: r.id,
    actor: r.email,
    action: r.action,
    entity: r.entity,
    entityId: r.entity_id,
    detail: r.detail,
    createdAt: toIso(r.created_at),
  }));
}
