import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getAssessment } from '@/lib/data/assessments';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('assessments:manage-own');
  return NextResponse.json({
    assessment: await getAssessment(actor, parseId((await context.params).id)),
  });
});
