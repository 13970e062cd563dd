import { NextResponse } from 'next/server';
import { z } from 'zod';
import { requireActor } from '@/lib/auth/session';
import { isFollowing, setFollowing } from '@/lib/data/follows';
import { handle, readJson } from '@/lib/http/handler';
import { parseInput } from '@/lib/validation/parse';
import { followSchema, slugSchema } from '@/lib/validation/cultivars';

type Context = { params: Promise<{ slug: string }> };
const slugOf = async (context: Context) =>
  parseInput(z.object({ slug: slugSchema }), await context.params).slug;

export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('properties:follow');
  return NextResponse.json({ following: await isFollowing(actor, await slugOf(context)) });
});

/** Follow or unfollow: `{ follow: true | false }`. */
export const PUT = handle(async (request, context: Context) => {
  const actor = await requireActor('properties:follow');
  const { follow } = parseInput(followSchema, await readJson(request));
  return NextResponse.json({ following: await setFollowing(actor, await slugOf(context), follow) });
});
