import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';

export interface OutboxMessage {
  id: number;
  from: string;
  to: string;
  subject: string;
  text: string;
  receivedAt: string;
}

function toMessage(r: Record<string, unknown>): OutboxMessage {
  return {
    id: Number(r.id),
    from: String(r.from_address),
    to: String(r.to_addresses),
    subject: String(r.subject),
    text: String(r.text_body),
    receivedAt: new Date(r.received_at as string).toISOString(),
  };
}

/** Messages the local mail catcher received, newest first; admins only. */
export async function listOutbox(actor: Actor, limit = 100): Promise<OutboxMessage[]> {
  assertCan(actor, 'outbox:read');
  const rows = await db('mail_outbox').orderBy('id', 'desc').limit(limit);
  return rows.map(toMessage);
}
