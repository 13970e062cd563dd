import 'server-only';
import type { Selectable } from 'kysely';
import { typed } from '@/lib/db-kysely';
import type { MailOutboxTable } from '@/lib/db-schema';
import { toIso } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';

export interface OutboxMessage {
  id: number;
  from: string;
  to: string;
  subject: string;
  text: string;
  receivedAt: string;
}

function toMessage(r: Selectable<MailOutboxTable>): OutboxMessage {
  return {
    id: r.id,
    from: r.from_address,
    to: r.to_addresses,
    subject: r.subject,
    text: r.text_body,
    receivedAt: toIso(r.received_at),
  };
}

/** Messages the local mail catcher received, newest first; admins only. */
export async function listOutbox(actor: Actor, limit = 100): Promise<OutboxMessage[]> {
  assertCan(actor, 'outbox:read');
  const rows = await typed()
    .selectFrom('mail_outbox')
    .selectAll()
    .orderBy('id', 'desc')
    .limit(limit)
    .execute();
  return rows.map(toMessage);
}
