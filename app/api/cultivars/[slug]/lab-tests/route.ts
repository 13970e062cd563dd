import { NextResponse } from 'next/server';
import { z } from 'zod';
import { requireActor } from '@/lib/auth/session';
import { createLabTest, listLabTests } from '@/lib/data/lab-tests';
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

/** The cultivar's lab tests, newest first. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('lab-tests:upload');
  const tests = await listLabTests(actor, { cultivarSlug: await slugOf(context) });
  return NextResponse.json({ tests });
});

/**
 * Upload a parallel-plate compression test as multipart/form-data: `file` (CSV, displacement in
 * mm and force in N), `diameterMm` or `radius1Mm` + `radius2Mm`, and `poisson`.
 */
export const POST = handle(
  async (request, context: Context) => {
    const actor = await requireActor('lab-tests:upload');
    const cultivarSlug = await slugOf(context);
    const form = await readUploadForm(request, UPLOAD_BODY_LIMIT);
    const { fileName, bytes } = await uploadedFile(form);
    const test = await createLabTest(actor, {
      cultivarSlug,
      fileName,
      bytes,
      fields: formObject(form),
    });
    return NextResponse.json({ test }, { status: 201 });
  },
  { accept: ['multipart/form-data'], maxBodyBytes: UPLOAD_BODY_LIMIT },
);
