import Link from 'next/link';
import type { ReactNode } from 'react';
import { InviteForm } from '@/components/invitations/invite-form';
import { PendingInvitations } from '@/components/invitations/pending-invitations';
import { RevisionList } from '@/components/revisions/revision-list';
import { StartDraftForm } from '@/components/revisions/start-draft-form';
import { PageTitle } from '@/components/ui/page-title';
import { areaDescription } from '@/lib/area-descriptions';
import { can, invitableRoles } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { listCultivarChoices, listEditorQueue } from '@/lib/data/editor-queue';
import { listOpenInvitations } from '@/lib/data/invitation-admin';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('editor:use', 'Editor');

function Section({ title, id, children }: { title: string; id: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="mt-8">
      <h2 id={id} className="mb-3 font-semibold">
        {title}
      </h2>
      {children}
    </section>
  );
}

export default async function EditorPage() {
  const actor = await requirePageActor('editor:use');
  const [queue, cultivars] = await Promise.all([
    listEditorQueue(actor),
    listCultivarChoices(actor),
  ]);
  const invites = can(actor.role, 'invitations:create-buyer');
  const invitations = invites ? await listOpenInvitations(actor) : [];
  return (
    <div>
      <PageTitle title="Editor">{areaDescription('/editor', actor.role)}</PageTitle>
      <nav aria-label="Editor tools" className="text-sm">
        <Link
          href="/editor/lab-tests"
          className="font-medium text-leaf-700 underline-offset-2 hover:underline"
        >
          Lab tests
        </Link>
        <span className="text-stone-600">
          {' '}
          — lab-test uploads (plate compression) and fitted moduli.
        </span>
        <br />
        <Link
          href="/editor/gaps"
          className="font-medium text-leaf-700 underline-offset-2 hover:underline"
        >
          Data gaps
        </Link>
        <span className="text-stone-600">
          {' '}
          — where each figure the checks take comes from, and which measurement to make next.
        </span>
      </nav>
      <Section title="Start a draft" id="start-draft">
        <p className="mb-3 text-sm text-stone-600">
          A draft starts as a copy of the cultivar&apos;s published values. Nothing changes for
          readers until another editor publishes it.
        </p>
        <StartDraftForm cultivars={cultivars} />
      </Section>
      <Section title="Your drafts and returned revisions" id="my-work">
        <RevisionList
          rows={queue.mine}
          own
          testId="my-revisions"
          empty="You have no open drafts. Start one above."
        />
      </Section>
      <Section title="Waiting for your review" id="review-queue">
        <RevisionList
          rows={queue.toReview}
          testId="review-queue"
          empty="No other editor's revision is waiting for review."
        />
      </Section>
      <Section title="Recently published" id="recently-published">
        <RevisionList rows={queue.published} testId="recently-published" empty="Nothing yet." />
      </Section>
      {invites ? (
        <Section title="Invite a buyer" id="invite-buyer">
          <p className="mb-3 text-sm text-stone-600">
            Buyers read handling guidance and published property summaries, nothing else.
          </p>
          <InviteForm roles={invitableRoles(actor.role).includes('buyer') ? ['buyer'] : []} />
          <h3 className="mb-3 mt-8 font-semibold">Your pending invitations</h3>
          <PendingInvitations invitations={invitations} />
        </Section>
      ) : null}
    </div>
  );
}
