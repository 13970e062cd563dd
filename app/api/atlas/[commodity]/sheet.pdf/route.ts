import { renderToBuffer } from '@react-pdf/renderer';
import { createElement } from 'react';
import { registerPdfFonts } from '@/lib/atlas/pdf/fonts';
import { SheetDocument } from '@/lib/atlas/pdf/sheet-document';
import { getHandlingSheet } from '@/lib/atlas/sheet';
import { requireActor } from '@/lib/auth/session';
import { NotFoundError } from '@/lib/errors';
import { handle } from '@/lib/http/handler';

type Context = { params: Promise<{ commodity: string }> };

/** The handling sheet rendered to PDF on the server (react-pdf, no browser), as a download. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('atlas:read');
  const { commodity } = await context.params;
  const sheet = await getHandlingSheet(actor, commodity);
  if (!sheet) throw new NotFoundError(`No handling sheet for "${commodity.slice(0, 80)}".`);
  registerPdfFonts();
  const pdf = await renderToBuffer(createElement(SheetDocument, { sheet }) as never);
  return new Response(new Uint8Array(pdf), {
    headers: {
      'Content-Type': 'application/pdf',
      'Content-Length': String(pdf.length),
      'Content-Disposition': `attachment; filename="tenderline-${sheet.commodity.slug}-handling-sheet.pdf"`,
    },
  });
});
