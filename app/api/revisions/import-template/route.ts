import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { listSources } from '@/lib/data/editor-queue';
import { handle } from '@/lib/http/handler';
import { templateCsv } from '@/lib/validation/import-csv';

/** The import template: the header row and one example row naming an existing source. */
export const GET = handle(async () => {
  const actor = await requireActor('revisions:edit');
  const [source] = await listSources(actor);
  return new NextResponse(templateCsv(source?.key ?? 'source-key'), {
    headers: {
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': 'attachment; filename="tenderline-values-template.csv"',
    },
  });
});
