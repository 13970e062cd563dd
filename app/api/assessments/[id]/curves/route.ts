import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getAssessment } from '@/lib/data/assessments';
import { getUnitSystem } from '@/lib/data/users';
import { curvesCsv } from '@/lib/checks/curves-csv';
import { CHECKS } from '@/lib/checks/registry';
import { handle } from '@/lib/http/handler';
import { reportIn } from '@/lib/reports/report-units';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** The saved curves as CSV. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('assessments:manage-own');
  const a = await getAssessment(actor, parseId((await context.params).id));
  const report = reportIn(CHECKS[a.check].show(a.results), await getUnitSystem(actor));
  return new NextResponse(curvesCsv(report.curves), {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="assessment-${a.id}-v${a.version}.csv"`,
    },
  });
});
