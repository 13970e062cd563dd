import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { createRelaxationTest, listRelaxationTests } from '@/lib/data/relaxation-tests';
import { handle } from '@/lib/http/handler';
import { UPLOAD_BODY_LIMIT } from '@/lib/lab-tests/limits';
import { cultivarSlugOf, readTestUpload } from '@/lib/lab-tests/read-upload';

type Context = { params: Promise<{ slug: string }> };

/** The cultivar's relaxation tests, newest first. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const tests = await listRelaxationTests(actor, {
    cultivarSlug: await cultivarSlugOf(context.params),
  });
  return NextResponse.json({ tests });
});

/**
 * Upload a stress-relaxation test as multipart/form-data: `file` (CSV, time in s from the end of
 * loading and force in N), `deformationMm` (the held plate travel), `specimen`, and optionally
 * `loadingRate` and `temperatureC`.
 */
export const POST = handle(
  async (request, context: Context) => {
    const actor = await requireActor('lab-tests:upload');
    const upload = await readTestUpload(request, await cultivarSlugOf(context.params));
    const { id, isDemo, fit } = await createRelaxationTest(actor, upload);
    return NextResponse.json({ test: { id, isDemo, fit } }, { status: 201 });
  },
  { accept: ['multipart/form-data'], maxBodyBytes: UPLOAD_BODY_LIMIT },
);
