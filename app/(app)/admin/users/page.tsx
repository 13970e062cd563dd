import { AdminTabs } from '@/components/admin/admin-tabs';
import { SignInLocks } from '@/components/admin/sign-in-locks';
import { USER_COLUMNS } from '@/components/admin/user-columns';
import { UserRowForm } from '@/components/admin/user-row-form';
import { InviteForm } from '@/components/invitations/invite-form';
import { PendingInvitations } from '@/components/invitations/pending-invitations';
import { PageTitle } from '@/components/ui/page-title';
import { invitableRoles } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { listOpenInvitations } from '@/lib/data/invitation-admin';
import { listSignInLocks, listUsers } from '@/lib/data/users';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('users:manage', 'Users');

export default async function UsersPage() {
  const actor = await requirePageActor('users:manage');
  const [users, invitations, locks] = await Promise.all([
    listUsers(actor),
    listOpenInvitations(actor),
    listSignInLocks(actor),
  ]);
  return (
    <section>
      <PageTitle title="Admin">
        Users, roles and invitations. Every change is written to the audit log.
      </PageTitle>
      <AdminTabs current="/admin/users" />
      <div className="rounded-lg border border-stone-200 bg-white" data-testid="users-list">
        <div
          className={`hidden gap-3 bg-stone-100 px-3 py-2 text-xs uppercase tracking-wide text-stone-600 md:grid ${USER_COLUMNS}`}
        >
          <span>User</span>
          <span>Role</span>
          <span>Account</span>
        </div>
        <ul>
          {users.map((u) => (
            <UserRowForm key={u.id} user={u} isSelf={u.id === actor.id} />
          ))}
        </ul>
      </div>
      <h2 className="mb-3 mt-8 font-semibold">Sign-in locks</h2>
      <SignInLocks
        locks={locks.map((l) => ({ ...l, untilIso: new Date(l.untilMs).toISOString() }))}
      />
      <h2 className="mb-3 mt-8 font-semibold">Pending invitations</h2>
      <PendingInvitations invitations={invitations} />
      <h2 className="mb-3 mt-8 font-semibold">Invite by e-mail</h2>
      <InviteForm roles={invitableRoles(actor.role)} />
    </section>
  );
}
