import type { Knex } from 'knex';

// Below lib/data, lib/auth and lib/photos: each records its writes here, so none of them has to
// import another's folder for it.
export interface AuditEntry {
  actorId: number | null;
  action: string;
  entity: string;
  entityId?: string | number | null;
  detail?: Record<string, unknown>;
}

/** Record one write; always called with the transaction that made the write. */
export async function recordAudit(trx: Knex.Transaction, entry: AuditEntry): Promise<void> {
  await trx('audit_log').insert({
    actor_id: entry.actorId,
    action: entry.action,
    entity: entry.entity,
    entity_id: entry.entityId == null ? null : String(entry.entityId),
    detail: entry.detail ? JSON.stringify(entry.detail) : null,
    created_at: new Date(),
  });
}
