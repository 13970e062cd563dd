import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { createLabTest, listLabTests } from '@/lib/data/lab-tests';
import { handle } from '@/lib/http/handler';
import { UPLOAD_BODY_LIMIT } from '@/lib/lab-tests/limits';
import { cultivarSlugOf, readTestUpload } from '@/lib/lab-tests/read-upload';

type Context = { params: Promise<{ slug: string }> };

/** The cultivar's lab tests, newest first. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const tests = await listLabTests(actor, { cultivarSlug: await cultivarSlugOf(context.params) });
  return NextResponse.json({ tests });
});

/**
 * Upload a parallel-plate compression test as multipart/form-data: `file` (CSV, displacement in
 * mm and force in N), `diameterMm` or `radius1Mm` + `radius2Mm`, and `poisson`.
 */
export const POST = handle(
  async (request, context: Context) => {
    const actor = await requireActor('lab-tests:upload');
    const upload = await readTestUpload(request, await cultivarSlugOf(context.params));
    const test = await createLabTest(actor, upload);
    return NextResponse.json({ test }, { status: 201 });
  },
  { accept: ['multipart/form-data'], maxBodyBytes: UPLOAD_BODY_LIMIT },
);
