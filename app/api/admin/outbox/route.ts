import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listOutbox } from '@/lib/data/outbox';
import { handle } from '@/lib/http/handler';

export const GET = handle(async () => {
  const actor = await requireActor('outbox:read');
  return NextResponse.json({ messages: await listOutbox(actor) });
});
