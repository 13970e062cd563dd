import 'server-only';
import { db } from '@/lib/db';
import { toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { auditFilterSchema, type AuditFilter } from '@/lib/validation/audit';
import { parseInput } from '@/lib/validation/parse';
import { recordNames } from './audit-records';

export interface AuditRow {
  id: number;
  /** The e-mail of who did it, or null (a sign-in attempt for an unknown address). */
  actor: string | null;
  actorName: string | null;
  action: string;
  entity: string;
  entityId: string | null;
  /** The record by name ("Apple, Jonathan: revision 3"), or null when it no longer exists. */
  record: string | null;
  /** The stored JSON text (lib/db-json.ts `auditDetail` parses it). */
  detail: string | null;
  createdAt: string;
}

const DAY_MS = 24 * 3600e3;

/**
 * The newest audit entries first, filtered by action, by who did it and by day (UTC, both ends
 * included); admins only. A filter that does not parse is a 400 with a message per field.
 */
export async function listAudit(
  actor: Actor,
  input: unknown = {},
  limit = 200,
): Promise<AuditRow[]> {
  assertCan(actor, 'audit:read');
  const filter: AuditFilter = parseInput(auditFilterSchema, input);
  let query = db('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .select(
      'a.id',
      'u.email',
      'u.name',
      'a.action',
      'a.entity',
      'a.entity_id',
      'a.detail',
      'a.created_at',
    )
    .orderBy('a.id', 'desc')
    .limit(limit);
  if (filter.action) query = query.where('a.action', filter.action);
  if (filter.actor) query = query.where('a.actor_id', filter.actor);
  if (filter.from) query = query.where('a.created_at', '>=', new Date(`${filter.from}T00:00:00Z`));
  if (filter.to) {
    query = query.where(
      'a.created_at',
      '<',
      new Date(Date.parse(`${filter.to}T00:00:00Z`) + DAY_MS),
    );
  }
  const rows = await query;
  const names = await recordNames(
    rows.map((r) => ({
      entity: String(r.entity),
      id: r.entity_id == null ? null : String(r.entity_id),
    })),
  );
  return rows.map((r) => ({
    id: Number(r.id),
    actor: r.email ?? null,
    actorName: r.name ?? null,
    action: r.action,
    entity: r.entity,
    entityId: r.entity_id == null ? null : String(r.entity_id),
    record: r.entity_id == null ? null : (names.get(`${r.entity}:${r.entity_id}`) ?? null),
    detail: r.detail ?? null,
    createdAt: toIso(r.created_at),
  }));
}

/** What the filter offers: every action recorded, and everyone who appears as the actor. */
export async function auditChoices(actor: Actor) {
  assertCan(actor, 'audit:read');
  const actions = await db('audit_log').distinct('action').orderBy('action');
  const people = await db('users')
    .whereIn('id', db('audit_log').distinct('actor_id').whereNotNull('actor_id'))
    .select('id', 'name', 'email')
    .orderBy('name');
  return {
    actions: actions.map((r) => String(r.action)),
    people: people.map((p) => ({ id: Number(p.id), name: String(p.name), email: String(p.email) })),
  };
}
