import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { returnRevision } from '@/lib/data/revisions';
import { handle, readJson } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** Return a revision in review to its author: `{ comment }`. */
export const POST = handle(async (request, context: Context) => {
  const actor = await requireActor('revisions:review');
  const id = parseId((await context.params).id);
  return NextResponse.json({ revision: await returnRevision(actor, id, await readJson(request)) });
});
