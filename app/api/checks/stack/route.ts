import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { runStackCheck } from '@/lib/checks/stack/check';
import { handle, readJson } from '@/lib/http/handler';

/** The stack check: JSON inputs in mm, g, MPa, kPa; JSON results with unit-named keys. */
export const POST = handle(async (request) => {
  const actor = await requireActor('checks:run');
  return NextResponse.json({ result: await runStackCheck(actor, await readJson(request)) });
});
