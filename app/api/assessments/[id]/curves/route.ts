import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getAssessment } from '@/lib/data/assessments';
import { curvesCsv } from '@/lib/checks/curves-csv';
import { CHECKS } from '@/lib/checks/registry';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** The saved curves as CSV. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('assessments:manage-own');
  const a = await getAssessment(actor, parseId((await context.params).id));
  return new NextResponse(curvesCsv(CHECKS[a.check].show(a.results).curves), {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="assessment-${a.id}-v${a.version}.csv"`,
    },
  });
});
