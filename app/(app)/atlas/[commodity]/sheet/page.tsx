import '@/components/atlas/print.css';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { HandlingSheet } from '@/components/atlas/handling-sheet';
import { PrintButton } from '@/components/atlas/print-button';
import { getAtlasArticle } from '@/lib/atlas/entries';
import { getHandlingSheet } from '@/lib/atlas/sheet';
import { requirePageActor } from '@/lib/auth/session';

type Props = { params: Promise<{ commodity: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const actor = await requirePageActor('atlas:read');
  const found = await getAtlasArticle(actor, (await params).commodity);
  return { title: found ? `Handling sheet: ${found.commodity.name}` : 'Not found' };
}

export default async function HandlingSheetPage({ params }: Props) {
  const actor = await requirePageActor('atlas:read');
  const { commodity } = await params;
  const sheet = await getHandlingSheet(actor, commodity);
  if (!sheet) notFound();
  return (
    <div>
      <p className="no-print mb-4 flex flex-wrap items-center gap-3 text-sm print:hidden">
        <Link href={`/atlas/${commodity}`} className="text-leaf-700 underline underline-offset-2">
          Back to the article
        </Link>
        <PrintButton />
        <a
          href={`/api/atlas/${commodity}/sheet.pdf`}
          className="rounded-md border border-stone-300 bg-white px-3 py-1.5 hover:bg-stone-100"
          data-testid="sheet-pdf-link"
        >
          Download PDF
        </a>
      </p>
      <HandlingSheet sheet={sheet} />
    </div>
  );
}
