import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { createDraftFromRelaxationTest } from '@/lib/data/relaxation-test-drafts';
import { handle } from '@/lib/http/handler';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/**
 * Start a draft revision of the test's cultivar holding its k₁ and k₂ (body `{}`): 201 with the
 * new draft, or 200 with the editor's open draft already made from this test.
 */
export const POST = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const id = parseId((await context.params).id);
  const { revisionId, created } = await createDraftFromRelaxationTest(actor, id);
  return NextResponse.json(
    { revision: { id: revisionId, href: `/editor/revisions/${revisionId}` }, created },
    { status: created ? 201 : 200 },
  );
});
