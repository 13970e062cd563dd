import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getAssessment } from '@/lib/data/assessments';
import { getUnitSystem } from '@/lib/data/users';
import { CHECKS } from '@/lib/checks/registry';
import { handle } from '@/lib/http/handler';
import { assessmentPdf } from '@/lib/reports/assessment-pdf';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** The report as a PDF download. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('assessments:manage-own');
  const a = await getAssessment(actor, parseId((await context.params).id));
  const pdf = await assessmentPdf(a, CHECKS[a.check], await getUnitSystem(actor));
  return new NextResponse(new Uint8Array(pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Disposition': `attachment; filename="assessment-${a.id}-v${a.version}.pdf"`,
    },
  });
});
