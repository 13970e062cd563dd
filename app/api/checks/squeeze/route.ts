import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { squeezeCheckJson } from '@/lib/checks/squeeze';
import { handle, readJson } from '@/lib/http/handler';

/** The squeeze check: JSON inputs in mm, g, MPa, kPa; results with unit-named keys. */
export const POST = handle(async (request) => {
  const actor = await requireActor('checks:run');
  const json = await squeezeCheckJson(actor, await readJson(request));
  return new NextResponse(json, { headers: { 'content-type': 'application/json' } });
});
