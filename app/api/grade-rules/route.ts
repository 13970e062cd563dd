import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { createGradeRule, listGradeRules } from '@/lib/data/grade-rules';
import { handle, readJson } from '@/lib/http/handler';
import { slugSchema } from '@/lib/validation/cultivars';
import { parseInput } from '@/lib/validation/parse';
import { z } from 'zod';

const query = z.object({ commodity: slugSchema.optional() });

/** The grade rules for a commodity (`?commodity=apple`), or those for any commodity. */
export const GET = handle(async (request) => {
  const actor = await requireActor('checks:run');
  const params = new URL(request.url).searchParams;
  const { commodity } = parseInput(query, { commodity: params.get('commodity') ?? undefined });
  return NextResponse.json({ rules: await listGradeRules(actor, commodity) });
});

/** Admin: the site's own grade rule. */
export const POST = handle(async (request) => {
  const actor = await requireActor('grade-rules:manage');
  const rule = await createGradeRule(actor, await readJson(request));
  return NextResponse.json({ rule }, { status: 201 });
});
