import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { runDropCheck } from '@/lib/checks/drop/check';
import { handle, readJson } from '@/lib/http/handler';

/** The drop check: JSON inputs in mm, g, MPa, kPa; JSON results with unit-named keys. */
export const POST = handle(async (request) => {
  const actor = await requireActor('checks:run');
  return NextResponse.json({ result: await runDropCheck(actor, await readJson(request)) });
});
