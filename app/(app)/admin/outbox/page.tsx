import { formatDateTime } from '@/lib/dates';
import { AdminTabs } from '@/components/admin/admin-tabs';
import { MailBody } from '@/components/admin/mail-body';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listOutbox } from '@/lib/data/outbox';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('outbox:read', 'Mail outbox');

export default async function OutboxPage() {
  const actor = await requirePageActor('outbox:read');
  const messages = await listOutbox(actor);
  return (
    <section>
      <PageTitle title="Admin">
        Messages received by the local mail catcher. In production the same mail goes to the
        site&apos;s mail provider.
      </PageTitle>
      <AdminTabs current="/admin/outbox" />
      {messages.length === 0 ? <p className="text-sm text-stone-600">No mail yet.</p> : null}
      <ul className="space-y-4" data-testid="outbox">
        {messages.map((m) => (
          <li
            key={m.id}
            className="rounded-lg border border-stone-200 bg-white p-4"
            data-testid="outbox-message"
          >
            <div className="flex flex-wrap justify-between gap-2 text-sm">
              <span className="font-medium wrap-anywhere">{m.subject}</span>
              <span className="num text-xs text-stone-500">{formatDateTime(m.receivedAt)}</span>
            </div>
            <p className="text-xs text-stone-500 wrap-anywhere">
              from {m.from} to {m.to}
            </p>
            <MailBody text={m.text} />
          </li>
        ))}
      </ul>
    </section>
  );
}
