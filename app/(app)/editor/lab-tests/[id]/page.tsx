import Link from 'next/link';
import { notFound } from 'next/navigation';
import { CurveChart } from '@/components/lab-tests/curve-chart';
import { FitFigures } from '@/components/lab-tests/fit-figures';
import { TestDraftPanel } from '@/components/lab-tests/test-draft-panel';
import { PageTitle } from '@/components/ui/page-title';
import { can } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { getLabTest } from '@/lib/data/lab-tests';
import { NotFoundError } from '@/lib/errors';
import { plotSeries } from '@/lib/lab-tests/plot';
import { titleFor } from '@/lib/page-title';
import { idSchema } from '@/lib/validation/id';

export const generateMetadata = titleFor('lab-tests:upload', 'Lab test');

async function load(actor: Awaited<ReturnType<typeof requirePageActor>>, raw: string) {
  const id = idSchema.safeParse(raw);
  if (!id.success) notFound();
  try {
    return await getLabTest(actor, id.data);
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

export default async function LabTestPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor('lab-tests:upload');
  const test = await load(actor, (await params).id);
  return (
    <section className="space-y-6">
      <PageTitle title={`Lab test #${test.id}`}>
        {test.cultivar.commodityName} — {test.cultivar.name}
        {test.isDemo ? ' (demo: an invented curve, not a measurement)' : ''}.{' '}
        <Link href="/editor/lab-tests" className="text-leaf-700 underline underline-offset-2">
          All lab tests
        </Link>
      </PageTitle>
      <FitFigures test={test} />
      {test.points && test.fit ? (
        <CurveChart series={plotSeries(test.points, test.fit)} fitToMm={test.fit.toMm} />
      ) : (
        <p className="rounded-md bg-clay-50 px-3 py-2 text-sm text-clay-700">
          The stored file could not be read back, so the readings cannot be drawn; the figures above
          are those recorded at upload.
        </p>
      )}
      {can(actor.role, 'revisions:edit') ? (
        <TestDraftPanel
          draftRevisionId={test.draftRevisionId}
          startedFrom="result"
          endpoint={`/api/lab-tests/${test.id}/draft`}
          label="Start a draft from this result"
        />
      ) : null}
    </section>
  );
}
