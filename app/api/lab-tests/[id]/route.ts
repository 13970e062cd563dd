import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getLabTest } from '@/lib/data/lab-tests';
import { handle } from '@/lib/http/handler';
import { plotSeries } from '@/lib/lab-tests/plot';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/**
 * One lab test: its figures, every reading (`points`, mm and N) and the fitted Hertz curve over
 * the fitted range (`fittedCurve`); `points` is null when the stored file cannot be read.
 */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const { points, fit, ...test } = await getLabTest(actor, parseId((await context.params).id));
  const fittedCurve =
    points && fit
      ? plotSeries(points, fit).fitted.map((p) => ({ displacementMm: p.d, forceN: p.f }))
      : null;
  return NextResponse.json({
    test: { ...test, pointsUsed: fit?.pointsUsed ?? null },
    points,
    fittedCurve,
  });
});
