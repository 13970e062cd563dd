import { InviteForm } from '@/components/admin/invite-form';
import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { invitableRoles } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Editor' };

export default async function EditorPage() {
  const actor = await requirePageActor('editor:use');
  return (
    <AreaPlaceholder title="Editor" href="/editor">
      <h2 className="mb-3 mt-8 font-semibold">Invite a buyer</h2>
      <p className="mb-3 text-sm text-stone-600">
        Buyers read handling guidance and published property summaries, nothing else.
      </p>
      <InviteForm roles={invitableRoles(actor.role).includes('buyer') ? ['buyer'] : []} />
    </AreaPlaceholder>
  );
}
