import { AdminTabs } from '@/components/admin/admin-tabs';
import { AuditFilters } from '@/components/admin/audit-filters';
import { AuditList } from '@/components/admin/audit-list';
import { FormMessage } from '@/components/ui/form-message';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { auditChoices, listAudit } from '@/lib/data/audit-reader';
import { titleFor } from '@/lib/page-title';
import { auditFilterSchema } from '@/lib/validation/audit';
import { fieldErrorsOf } from '@/lib/validation/parse';

export const generateMetadata = titleFor('audit:read', 'Audit log');

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function AuditPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await requirePageActor('audit:read');
  const raw = await searchParams;
  const values = {
    action: one(raw.action),
    actor: one(raw.actor),
    from: one(raw.from),
    to: one(raw.to),
  };
  // A filter that does not parse is shown with its messages beside the fields, over the whole log.
  const parsed = auditFilterSchema.safeParse(values);
  const errors = parsed.success ? {} : fieldErrorsOf(parsed.error);
  const filter = parsed.success ? parsed.data : {};
  const [entries, choices] = await Promise.all([listAudit(actor, filter), auditChoices(actor)]);
  const filtered = Object.values(filter).some((v) => v !== undefined);
  return (
    <section>
      <PageTitle title="Admin">Every write, newest first (latest 200 that match).</PageTitle>
      <AdminTabs current="/admin/audit" />
      <AuditFilters
        actions={choices.actions}
        people={choices.people}
        values={values}
        errors={errors}
      />
      {parsed.success ? null : (
        <FormMessage tone="error" message="The filter was not applied: see the fields above." />
      )}
      <AuditList entries={entries} filtered={filtered} />
    </section>
  );
}
