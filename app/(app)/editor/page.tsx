import { InviteForm } from '@/components/invitations/invite-form';
import { PendingInvitations } from '@/components/invitations/pending-invitations';
import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { can, invitableRoles } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { listOpenInvitations } from '@/lib/data/invitation-admin';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('editor:use', 'Editor');

export default async function EditorPage() {
  const actor = await requirePageActor('editor:use');
  if (!can(actor.role, 'invitations:create-buyer')) {
    return <AreaPlaceholder title="Editor" href="/editor" role={actor.role} />;
  }
  const invitations = await listOpenInvitations(actor);
  return (
    <AreaPlaceholder title="Editor" href="/editor" role={actor.role}>
      <h2 className="mb-3 mt-8 font-semibold">Invite a buyer</h2>
      <p className="mb-3 text-sm text-stone-600">
        Buyers read handling guidance and published property summaries, nothing else.
      </p>
      <InviteForm roles={invitableRoles(actor.role).includes('buyer') ? ['buyer'] : []} />
      <h2 className="mb-3 mt-8 font-semibold">Your pending invitations</h2>
      <PendingInvitations invitations={invitations} />
    </AreaPlaceholder>
  );
}
