import 'server-only';
import { notFound } from 'next/navigation';
import type { Actor } from '@/lib/auth/actor';
import { can } from '@/lib/auth/roles';
import { getCultivar, getRevision } from '@/lib/data/cultivars';
import { NotFoundError } from '@/lib/errors';
import { idSchema } from '@/lib/validation/id';

/**
 * What the revision page shows: `edit` for the author of a draft or returned revision, `review`
 * for another editor while it is in review, `waiting` for the author while it is in review,
 * `read` for everything else (published, superseded, someone else's draft).
 */
export type RevisionMode = 'edit' | 'review' | 'waiting' | 'read';

function modeOf(actor: Actor, authorId: number, status: string): RevisionMode {
  const own = authorId === actor.id;
  if (own && (status === 'draft' || status === 'returned')) return 'edit';
  if (status === 'in_review') {
    if (own) return 'waiting';
    if (can(actor.role, 'revisions:review')) return 'review';
  }
  return 'read';
}

async function revisionOr404(actor: Actor, id: number) {
  try {
    return await getRevision(actor, id);
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

export async function loadRevisionView(actor: Actor, rawId: string) {
  const parsed = idSchema.safeParse(rawId);
  if (!parsed.success) notFound();
  const revision = await revisionOr404(actor, parsed.data);
  const [cultivar, base] = await Promise.all([
    getCultivar(actor, revision.cultivarSlug),
    revision.basedOnId === null ? null : getRevision(actor, revision.basedOnId),
  ]);
  const open = ['draft', 'returned', 'in_review'].includes(revision.status);
  const published = cultivar.published;
  // Stale: something other than the base has been published since the draft was started.
  const stale = open && (published?.id ?? null) !== revision.basedOnId;
  return {
    revision,
    cultivar,
    base,
    mode: modeOf(actor, revision.authorId, revision.status),
    stale: stale ? { publishedNumber: published?.number ?? null } : null,
  };
}

export type RevisionView = Awaited<ReturnType<typeof loadRevisionView>>;
