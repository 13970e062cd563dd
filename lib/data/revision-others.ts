import 'server-only';
import type { Knex } from 'knex';
import { typed } from '@/lib/db-kysely';
import { assertCan, type Actor } from '@/lib/auth/actor';
import type { RevisionStatus } from '@/lib/properties/quantities';

/** Another open revision of the same cultivar: whose, and how far along. */
export interface OpenRevision {
  number: number;
  status: RevisionStatus;
  authorName: string;
}

/**
 * The cultivar's other drafts, returned revisions and revisions in review: whichever of them is
 * published first makes the others stale, so the editor starting or editing one is told.
 */
export async function otherOpenRevisions(
  trx: Knex.Transaction | undefined,
  cultivarId: number,
  exceptId: number,
): Promise<OpenRevision[]> {
  const rows = await typed(trx)
    .selectFrom('property_revisions as r')
    .innerJoin('users as a', 'a.id', 'r.author_id')
    .select(['r.number', 'r.status', 'a.name as author_name'])
    .where('r.cultivar_id', '=', cultivarId)
    .where('r.id', '!=', exceptId)
    .where('r.status', 'in', ['draft', 'returned', 'in_review'])
    .orderBy('r.number')
    .execute();
  return rows.map((r) => ({
    number: r.number,
    status: r.status as RevisionStatus,
    authorName: r.author_name,
  }));
}

/** The same, for the page of one revision (editors only). */
export async function listOtherOpenRevisions(
  actor: Actor,
  revision: { id: number; cultivarId: number },
): Promise<OpenRevision[]> {
  assertCan(actor, 'revisions:edit');
  return otherOpenRevisions(undefined, revision.cultivarId, revision.id);
}
