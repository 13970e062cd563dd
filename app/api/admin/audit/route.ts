import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listAudit } from '@/lib/data/audit-reader';
import { handle } from '@/lib/http/handler';

export const GET = handle(async () => {
  const actor = await requireActor('audit:read');
  return NextResponse.json({ entries: await listAudit(actor) });
});
