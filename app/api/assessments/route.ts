import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { createAssessment } from '@/lib/checks/assessments';
import { getAssessment, listAssessments } from '@/lib/data/assessments';
import { handle, readJson } from '@/lib/http/handler';

/** The signed-in user's assessments (an admin's: everyone's); `?check=&cultivar=`. */
export const GET = handle(async (request) => {
  const actor = await requireActor('assessments:manage-own');
  const filter = Object.fromEntries(new URL(request.url).searchParams);
  return NextResponse.json({ assessments: await listAssessments(actor, filter) });
});

/** Save a check: `{ check, title, notes?, inputs }`; the server runs it and pins its data. */
export const POST = handle(async (request) => {
  const actor = await requireActor('assessments:manage-own');
  const id = await createAssessment(actor, await readJson(request));
  return NextResponse.json({ assessment: await getAssessment(actor, id) }, { status: 201 });
});
