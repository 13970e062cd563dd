import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { runSqueezeCheck } from '@/lib/checks/squeeze/check';
import { handle, readJson } from '@/lib/http/handler';

/** The squeeze check: JSON inputs in mm, g, MPa, kPa; results with unit-named keys. */
export const POST = handle(async (request) => {
  const actor = await requireActor('checks:run');
  const result = await runSqueezeCheck(actor, await readJson(request), request.signal);
  return NextResponse.json({ result });
});
