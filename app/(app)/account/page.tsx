import { ChangePasswordForm } from '@/components/account/change-password-form';
import { SignOutEverywhere } from '@/components/account/sign-out-everywhere';
import { UnitSystemForm } from '@/components/account/unit-system-form';
import { WorkflowMailForm } from '@/components/account/workflow-mail-form';
import { can } from '@/lib/auth/roles';
import { getWorkflowMail } from '@/lib/data/revision-mail-setting';
import { getUnitSystem } from '@/lib/data/users';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Account' };

export default async function AccountPage() {
  const actor = await requirePageActor('account:manage-own');
  return (
    <section>
      <PageTitle title="Your account">
        {actor.name} · {actor.email} · role <strong>{actor.role}</strong>
      </PageTitle>
      <h2 className="mb-3 font-semibold">Change password</h2>
      <ChangePasswordForm />
      <h2 className="mb-3 mt-10 font-semibold">Display units</h2>
      <UnitSystemForm current={await getUnitSystem(actor)} />
      {can(actor.role, 'revisions:edit') ? (
        <>
          <h2 className="mb-3 mt-10 font-semibold">Revision e-mails</h2>
          <WorkflowMailForm current={await getWorkflowMail(actor)} />
        </>
      ) : null}
      <h2 className="mb-3 mt-10 font-semibold">Sessions</h2>
      <SignOutEverywhere />
    </section>
  );
}
