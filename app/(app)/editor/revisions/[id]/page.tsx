import Link from 'next/link';
import type { ReactNode } from 'react';
import { AddSourceForm } from '@/components/revisions/add-source-form';
import { ConflictPanel } from '@/components/revisions/conflict-panel';
import { DraftForm } from '@/components/revisions/draft-form';
import { ImportPanel } from '@/components/revisions/import-panel';
import { baseText } from '@/components/revisions/format';
import { ReviewPanel } from '@/components/revisions/review-panel';
import { RevisionDiff } from '@/components/revisions/revision-diff';
import { OpenRevisionsNotice } from '@/components/revisions/open-revisions-notice';
import { RevisionMeta } from '@/components/revisions/revision-meta';
import { StaleNotice } from '@/components/revisions/stale-notice';
import { ValueList } from '@/components/revisions/value-list';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listSources } from '@/lib/data/editor-queue';
import { listConflicts } from '@/lib/data/revision-conflicts';
import { listOtherOpenRevisions } from '@/lib/data/revision-others';
import { toDiffValue } from '@/lib/data/follows';
import { titleFor } from '@/lib/page-title';
import { diffRevisions } from '@/lib/properties/diff';
import { valueFieldsOf } from '@/lib/validation/revision-form';
import { loadRevisionView, type RevisionView } from './load';

export const generateMetadata = titleFor('revisions:edit', 'Revision');

const NOTE: Record<RevisionView['mode'], (v: RevisionView) => string> = {
  edit: () => 'Your draft: edit the values, save, and submit it for review by another editor.',
  waiting: () =>
    'Submitted: waiting for another editor to publish or return it. Nobody reviews their own revision.',
  review: (v) =>
    `Submitted by ${v.revision.authorName}: compare it with its base, then publish or return it.`,
  read: (v) =>
    v.revision.status === 'published' || v.revision.status === 'superseded'
      ? 'Published revisions are kept as they were; change the values by starting a new draft.'
      : `${v.revision.authorName}'s revision; only its author edits it.`,
};

function Block({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="mt-6">
      <h2 className="mb-2 font-semibold">{title}</h2>
      {children}
    </section>
  );
}

export default async function RevisionPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor('revisions:edit');
  const view = await loadRevisionView(actor, (await params).id);
  const { revision: r, cultivar, base, mode, stale } = view;
  const baseLabel = baseText(base?.number ?? null);
  const diff = diffRevisions((base?.values ?? []).map(toDiffValue), r.values.map(toDiffValue));
  const editing = mode === 'edit';
  const open = ['draft', 'returned', 'in_review'].includes(r.status);
  const [sources, conflicts, others] = await Promise.all([
    editing ? listSources(actor) : [],
    editing ? listConflicts(actor, r.id) : [],
    open ? listOtherOpenRevisions(actor, r) : [],
  ]);
  const newest = cultivar.published;
  return (
    <div>
      <p className="mb-2 text-sm">
        <Link href="/editor" className="text-leaf-700 underline-offset-2 hover:underline">
          ← Editor
        </Link>
      </p>
      <PageTitle title={`${cultivar.commodity.name}, ${cultivar.name} — revision ${r.number}`}>
        {NOTE[mode](view)}
      </PageTitle>
      <RevisionMeta revision={r} cultivarSlug={cultivar.slug} baseNumber={base?.number ?? null} />
      {others.length ? (
        <div className="mt-4">
          <OpenRevisionsNotice cultivar={cultivar.name} others={others} />
        </div>
      ) : null}
      {stale ? (
        <div className="mt-4">
          <StaleNotice
            revisionId={r.id}
            baseNumber={base?.number ?? null}
            publishedNumber={stale.publishedNumber}
            canRebase={r.authorId === actor.id}
          />
        </div>
      ) : null}
      {mode === 'edit' ? (
        <>
          {conflicts.length ? (
            <Block title="Conflicts to decide before submitting">
              <ConflictPanel revisionId={r.id} conflicts={conflicts} />
            </Block>
          ) : null}
          <Block title="Values">
            <DraftForm
              // A new key when the stored values changed under the form (an import, a rebase, a
              // decided conflict), so it starts again from them; a plain save keeps its state.
              key={`${r.id}:${r.basedOnId}:${r.values.length}:${conflicts.length}`}
              revisionId={r.id}
              summary={r.summary ?? ''}
              values={r.values.map(valueFieldsOf)}
              sources={sources.map(({ key, authors, year, title }) => ({
                key,
                authors,
                year,
                title,
              }))}
              published={{
                label: baseText(newest?.number ?? null),
                values: cultivar.values.map(toDiffValue),
              }}
            />
          </Block>
          <Block title="Sources">
            <AddSourceForm revisionId={r.id} />
          </Block>
          <Block title="Import values from CSV">
            <ImportPanel revisionId={r.id} />
          </Block>
        </>
      ) : (
        <>
          {mode === 'waiting' ? (
            <p
              className="mt-4 rounded-md border border-amber-200 bg-amber-50 px-3 py-2 text-sm text-amber-900"
              data-testid="waiting-note"
            >
              In review: waiting for another editor. You cannot publish your own revision.
            </p>
          ) : null}
          <Block title={`Changes against ${baseLabel}`}>
            <RevisionDiff rows={diff} baseLabel={baseLabel} />
          </Block>
          {mode === 'review' ? (
            <Block title="Your review">
              <ReviewPanel revisionId={r.id} />
            </Block>
          ) : null}
          <Block title="Values">
            <ValueList values={r.values} />
          </Block>
        </>
      )}
    </div>
  );
}
