import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { importDraftValues } from '@/lib/data/value-import';
import { readBytes } from '@/lib/http/body';
import { handle } from '@/lib/http/handler';
import { readUploadForm, uploadedFile } from '@/lib/lab-tests/read-upload';
import { MAX_IMPORT_BYTES } from '@/lib/validation/import-csv';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string }> };

/** The file and a multipart envelope around it. */
const BODY_LIMIT = MAX_IMPORT_BYTES + 64 * 1024;

/**
 * Append values to a draft from a CSV file (columns as in /api/revisions/import-template): the
 * file as multipart/form-data (`file`) or as the text/csv body itself. All rows or none: a 400
 * lists the errors by line (`fieldErrors["line 3"]`, line 1 being the header).
 */
export const POST = handle(
  async (request, context: Context) => {
    const actor = await requireActor('revisions:edit');
    const id = parseId((await context.params).id);
    const multipart = request.headers.get('content-type')?.startsWith('multipart/form-data');
    const bytes = multipart
      ? (await uploadedFile(await readUploadForm(request, BODY_LIMIT))).bytes
      : await readBytes(request, BODY_LIMIT);
    const result = await importDraftValues(actor, id, bytes);
    return NextResponse.json({ import: result });
  },
  { accept: ['multipart/form-data', 'text/csv'], maxBodyBytes: BODY_LIMIT },
);
