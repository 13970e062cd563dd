import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { rerunAssessment } from '@/lib/checks/assessments';
import { getAssessment } from '@/lib/data/assessments';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** Re-run on today's published data; the old assessment stays as it was. */
export const POST = handle(async (_request, context: Context) => {
  const actor = await requireActor('assessments:manage-own');
  const id = await rerunAssessment(actor, parseId((await context.params).id));
  return NextResponse.json({ assessment: await getAssessment(actor, id) }, { status: 201 });
});
