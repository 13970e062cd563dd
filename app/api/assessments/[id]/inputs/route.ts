import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getAssessment } from '@/lib/data/assessments';
import { getUnitSystem } from '@/lib/data/users';
import { inputsCsv } from '@/lib/checks/inputs-csv';
import { CHECKS } from '@/lib/checks/registry';
import { pinnedSchema } from '@/lib/checks/used-value';
import { handle } from '@/lib/http/handler';
import { reportIn } from '@/lib/reports/report-units';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** The saved inputs as CSV: each figure with its rung and source, the revisions pinned. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('assessments:manage-own');
  const a = await getAssessment(actor, parseId((await context.params).id));
  const report = reportIn(CHECKS[a.check].show(a.results), await getUnitSystem(actor));
  const csv = inputsCsv(
    report,
    pinnedSchema.parse(a.results.pinned ?? null),
    a.modelVersion,
    report.restsOn,
  );
  return new NextResponse(csv, {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="assessment-${a.id}-v${a.version}-inputs.csv"`,
    },
  });
});
