import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { runSqueezeCheck } from '@/lib/checks/squeeze';
import { handle, readJson } from '@/lib/http/handler';

/** The squeeze check: JSON inputs in mm, g, MPa, kPa; results with unit-named keys. */
export const POST = handle(async (request) => {
  const actor = await requireActor('checks:run');
  return NextResponse.json({ result: await runSqueezeCheck(actor, await readJson(request)) });
});
