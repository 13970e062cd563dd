import { NextResponse } from 'next/server';
import { z } from 'zod';
import { requireActor } from '@/lib/auth/session';
import { createRelaxationTest, listRelaxationTests } from '@/lib/data/relaxation-tests';
import { handle } from '@/lib/http/handler';
import { UPLOAD_BODY_LIMIT } from '@/lib/lab-tests/limits';
import { readUploadForm, uploadedFile } from '@/lib/lab-tests/read-upload';
import { formObject } from '@/lib/validation/form';
import { parseInput } from '@/lib/validation/parse';
import { slugSchema } from '@/lib/validation/cultivars';

type Context = { params: Promise<{ slug: string }> };
const slugOf = async (context: Context) =>
  parseInput(z.object({ cultivar: slugSchema }), { cultivar: (await context.params).slug })
    .cultivar;

/** The cultivar's relaxation tests, newest first. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const tests = await listRelaxationTests(actor, { cultivarSlug: await slugOf(context) });
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
    const cultivarSlug = await slugOf(context);
    const form = await readUploadForm(request, UPLOAD_BODY_LIMIT);
    const { fileName, bytes } = await uploadedFile(form);
    const { id, isDemo, fit } = await createRelaxationTest(actor, {
      cultivarSlug,
      fileName,
      bytes,
      fields: formObject(form),
    });
    return NextResponse.json({ test: { id, isDemo, fit } }, { status: 201 });
  },
  { accept: ['multipart/form-data'], maxBodyBytes: UPLOAD_BODY_LIMIT },
);
