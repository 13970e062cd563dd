import { AdminTabs } from '@/components/admin/admin-tabs';
import { InviteForm } from '@/components/admin/invite-form';
import { UserRowForm } from '@/components/admin/user-row-form';
import { PageTitle } from '@/components/ui/page-title';
import { invitableRoles } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { listUsers } from '@/lib/data/users';

export const metadata = { title: 'Users' };

export default async function UsersPage() {
  const actor = await requirePageActor('users:manage');
  const users = await listUsers(actor);
  return (
    <section>
      <PageTitle title="Admin">
        Users, roles and invitations. Every change is written to the audit log.
      </PageTitle>
      <AdminTabs current="/admin/users" />
      <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-stone-100 text-xs uppercase tracking-wide text-stone-600">
            <tr>
              <th className="px-3 py-2">User</th>
              <th className="px-3 py-2">Role</th>
              <th className="px-3 py-2">Account</th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <UserRowForm key={u.id} user={u} isSelf={u.id === actor.id} />
            ))}
          </tbody>
        </table>
      </div>
      <h2 className="mb-3 mt-8 font-semibold">Invite by e-mail</h2>
      <InviteForm roles={invitableRoles(actor.role)} />
    </section>
  );
}
