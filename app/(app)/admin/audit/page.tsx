import { AdminTabs } from '@/components/admin/admin-tabs';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listAudit } from '@/lib/data/audit-log';

export const metadata = { title: 'Audit log' };

export default async function AuditPage() {
  const actor = await requirePageActor('audit:read');
  const entries = await listAudit(actor);
  return (
    <section>
      <PageTitle title="Admin">Every write, newest first (latest 200).</PageTitle>
      <AdminTabs current="/admin/audit" />
      <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
        <table className="w-full text-left text-sm">
          <thead className="bg-stone-100 text-xs uppercase tracking-wide text-stone-600">
            <tr>
              <th className="px-3 py-2">When (UTC)</th>
              <th className="px-3 py-2">Who</th>
              <th className="px-3 py-2">Action</th>
              <th className="px-3 py-2">Record</th>
              <th className="px-3 py-2">Detail</th>
            </tr>
          </thead>
          <tbody>
            {entries.map((e) => (
              <tr key={e.id} className="border-t border-stone-200 align-top">
                <td className="num px-3 py-2 text-xs">
                  {e.createdAt.replace('T', ' ').slice(0, 19)}
                </td>
                <td className="px-3 py-2">{e.actor ?? '—'}</td>
                <td className="px-3 py-2">{e.action}</td>
                <td className="px-3 py-2">
                  {e.entity} {e.entityId}
                </td>
                <td className="px-3 py-2 font-mono text-xs break-all">{e.detail}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
