import { NextResponse } from 'next/server';
import { z } from 'zod';
import { requireActor } from '@/lib/auth/session';
import { listRevisions } from '@/lib/data/cultivars';
import { createDraft } from '@/lib/data/revisions';
import { handle, readJson } from '@/lib/http/handler';
import { parseInput } from '@/lib/validation/parse';
import { slugSchema } from '@/lib/validation/cultivars';

type Context = { params: Promise<{ slug: string }> };
const slugOf = async (context: Context) =>
  parseInput(z.object({ slug: slugSchema }), await context.params).slug;

/** The cultivar's revisions, newest first (drafts only for editors and admins). */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('properties:read-history');
  return NextResponse.json({ revisions: await listRevisions(actor, await slugOf(context)) });
});

/** Start a draft from the published revision: `{ summary? }`. */
export const POST = handle(async (request, context: Context) => {
  const actor = await requireActor('revisions:edit');
  const { summary } = parseInput(
    z.object({ summary: z.string().trim().max(500).nullable().optional() }),
    await readJson(request),
  );
  const draft = await createDraft(actor, await slugOf(context), summary);
  return NextResponse.json({ revision: draft }, { status: 201 });
});
