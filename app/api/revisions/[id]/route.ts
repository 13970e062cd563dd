import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getRevision } from '@/lib/data/cultivars';
import { updateDraft } from '@/lib/data/revisions';
import { handle, readJson } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** One revision with its values (drafts only for editors and admins). */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('properties:read-history');
  return NextResponse.json({
    revision: await getRevision(actor, parseId((await context.params).id)),
  });
});

/** Replace a draft's values: `{ summary?, values: [{ quantity, variant, value, low, high, … }] }`. */
export const PUT = handle(async (request, context: Context) => {
  const actor = await requireActor('revisions:edit');
  const id = parseId((await context.params).id);
  return NextResponse.json({ revision: await updateDraft(actor, id, await readJson(request)) });
});
