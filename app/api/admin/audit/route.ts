import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listAudit } from '@/lib/data/audit-reader';
import { handle } from '@/lib/http/handler';

/**
 * The audit log, newest first; admins only. Optional query: action (`invitation.create`), actor
 * (a user id), from and to (days, `2026-12-01`, UTC, both included). A bad one is a 400 naming it.
 */
export const GET = handle(async (request) => {
  const actor = await requireActor('audit:read');
  const query = Object.fromEntries(new URL(request.url).searchParams);
  return NextResponse.json({ entries: await listAudit(actor, query) });
});
