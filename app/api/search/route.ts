import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { handle } from '@/lib/http/handler';
import { getSearchIndex } from '@/lib/search/index-cache';
import { searchQuerySchema } from '@/lib/search/query';
import { parseInput } from '@/lib/validation/parse';

/** The header's search: `?q=` over the records the caller's role may see, grouped by kind. */
export const GET = handle(async (request) => {
  const actor = await requireActor('atlas:read');
  const { q } = parseInput(searchQuerySchema, {
    q: new URL(request.url).searchParams.get('q') ?? '',
  });
  const index = await getSearchIndex(actor);
  return NextResponse.json(index.search(q));
});
