import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { submitDraft } from '@/lib/data/revisions';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

export const POST = handle(async (_request, context: Context) => {
  const actor = await requireActor('revisions:edit');
  return NextResponse.json({
    revision: await submitDraft(actor, parseId((await context.params).id)),
  });
});
