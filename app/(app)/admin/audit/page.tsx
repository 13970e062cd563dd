import { AdminTabs } from '@/components/admin/admin-tabs';
import { AuditList } from '@/components/admin/audit-list';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listAudit } from '@/lib/data/audit-reader';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('audit:read', 'Audit log');

export default async function AuditPage() {
  const actor = await requirePageActor('audit:read');
  const entries = await listAudit(actor);
  return (
    <section>
      <PageTitle title="Admin">Every write, newest first (latest 200).</PageTitle>
      <AdminTabs current="/admin/audit" />
      <AuditList entries={entries} />
    </section>
  );
}
