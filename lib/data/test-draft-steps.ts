import 'server-only';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import type { Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit-trail';

/** A source row a lab upload cites, as lib/lab-tests builds it. */
export interface TestSource {
  key: string;
  kind: 'report' | 'demo';
  authors: string;
  year: number;
  title: string;
  venue: string;
  note: string | null;
}

/** The test's source, created once (with its audit row) and reused by later drafts. */
export async function ensureTestSource(
  actor: Actor,
  source: TestSource,
  detail: Record<string, unknown>,
): Promise<void> {
  await db.transaction(async (trx) => {
    if (await trx('sources').where({ key: source.key }).first()) return;
    await trx('sources').insert({ ...source, created_at: new Date() });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'source.create',
      entity: 'source',
      entityId: source.key,
      detail: { kind: source.kind, ...detail },
    });
  });
}

/** The draft recorded on a test, if it is still this actor's and still editable. */
export async function openDraftOf(actor: Actor, draftRevisionId: number | null) {
  if (draftRevisionId === null) return null;
  const row = await typed()
    .selectFrom('property_revisions')
    .select('id')
    .where('id', '=', draftRevisionId)
    .where('author_id', '=', actor.id)
    .where('status', 'in', ['draft', 'returned'])
    .executeTakeFirst();
  return row ? row.id : null;
}

/**
 * Remove a draft this actor just made. createDraft and updateDraft each commit on their own; if a
 * later step fails, the new draft goes again so no half-made draft is left behind.
 */
export async function discardDraft(actor: Actor, id: number, reason: string): Promise<void> {
  await db.transaction(async (trx) => {
    const mine = trx('property_revisions').where({ id, author_id: actor.id, status: 'draft' });
    if (!(await mine.clone().first())) return;
    await trx('revision_values').where({ revision_id: id }).delete();
    await mine.delete();
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'revision.discard',
      entity: 'revision',
      entityId: id,
      detail: { reason },
    });
  });
}
