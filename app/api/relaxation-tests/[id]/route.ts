import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getRelaxationTest } from '@/lib/data/relaxation-tests';
import { handle } from '@/lib/http/handler';
import { relaxationPlot } from '@/lib/lab-tests/relaxation-plot';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/**
 * One relaxation test: its figures, every reading (`readings`, s and N), the fitted Peleg curve
 * over the hold (`fittedCurve`) and the share of force kept at 1, 5 and 30 s (`retained`);
 * `readings` is null when the stored file cannot be read.
 */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const { readings, fit, ...test } = await getRelaxationTest(
    actor,
    parseId((await context.params).id),
  );
  const plot = relaxationPlot(test, readings);
  return NextResponse.json({
    test: { ...test, pointsUsed: fit?.points ?? null },
    readings,
    fittedCurve: readings ? plot.fitted.map((p) => ({ timeS: p.t, forceN: p.f })) : null,
    retained: plot.retained,
  });
});
