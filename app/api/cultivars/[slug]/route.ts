import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getCultivar } from '@/lib/data/cultivars';
import { handle } from '@/lib/http/handler';
import { cultivarJson } from '@/lib/properties/api-shape';
import { parseInput } from '@/lib/validation/parse';
import { slugSchema } from '@/lib/validation/cultivars';
import { z } from 'zod';

type Context = { params: Promise<{ slug: string }> };

/** One cultivar's published values with spread, conditions and sources. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('properties:read-published');
  const { slug } = parseInput(z.object({ slug: slugSchema }), await context.params);
  return NextResponse.json({ cultivar: cultivarJson(await getCultivar(actor, slug)) });
});
