import { formatDateTime } from '@/lib/dates';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ReportActions } from '@/components/assessments/report-actions';
import { ReportResults } from '@/components/assessments/report-results';
import { MarginPanel } from '@/components/checks/margin-panel';
import { CautionNote } from '@/components/shell/caution-note';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { checkHref } from '@/lib/checks/check-url';
import { CHECKS } from '@/lib/checks/registry';
import { marginBasis } from '@/lib/checks/report';
import { getAssessment } from '@/lib/data/assessments';
import { NotFoundError, ValidationError } from '@/lib/errors';
import { titleFor } from '@/lib/page-title';
import { parseId } from '@/lib/validation/id';

export const generateMetadata = titleFor('assessments:manage-own', 'Assessment report');

async function load(id: string) {
  const actor = await requirePageActor('assessments:manage-own');
  try {
    return await getAssessment(actor, parseId(id));
  } catch (error) {
    if (error instanceof NotFoundError || error instanceof ValidationError) notFound();
    throw error;
  }
}

export default async function AssessmentReport({ params }: { params: Promise<{ id: string }> }) {
  const a = await load((await params).id);
  const check = CHECKS[a.check];
  const report = check.show(a.results);
  const margin = report.margin;
  return (
    <article className="space-y-6" data-testid="assessment-report">
      <PageTitle title={a.title}>
        {check.title} · version {a.version} · saved {formatDateTime(a.createdAt)} by {a.ownerName} ·
        model {a.modelVersion}
        {a.parentId ? (
          <>
            {' '}
            · re-run of{' '}
            <Link href={`/assessments/${a.parentId}`} className="underline">
              assessment {a.parentId}
            </Link>
          </>
        ) : null}
      </PageTitle>
      <div className="space-y-1 text-sm" data-testid="pinned-data">
        {a.cultivarSlug ? (
          <p>
            Data:{' '}
            <Link href={`/properties/${a.cultivarSlug}`} className="underline">
              {a.cultivarName}
            </Link>
            , property revision <span className="num">{a.revisionNumber}</span>.
          </p>
        ) : (
          <p>Data: values entered by hand (no cultivar).</p>
        )}
        {a.newerRevision ? (
          <p className="rounded-md bg-amber-50 px-3 py-2 text-amber-900" data-testid="newer-data">
            Revision {a.newerRevision.number} of this cultivar has been published since. These
            figures are the ones computed with revision {a.revisionNumber}; re-run to see them with
            the newer data (the re-run is saved beside this one).
          </p>
        ) : null}
        {a.newerCommodityRevision ? (
          <p
            className="rounded-md bg-amber-50 px-3 py-2 text-amber-900"
            data-testid="newer-commodity-data"
          >
            Revision {a.newerCommodityRevision.number} of the commodity record this result inherited
            figures from has been published since. Re-run to see the figures with the newer data
            (the re-run is saved beside this one).
          </p>
        ) : null}
        {a.notes ? <p className="whitespace-pre-wrap text-stone-700">{a.notes}</p> : null}
      </div>
      <ReportActions
        id={a.id}
        canRerun={Boolean(a.newerRevision || a.newerCommodityRevision)}
        openHref={checkHref(a.check, a.inputs)}
      />
      <MarginPanel
        hasResult
        margin={margin}
        pending={false}
        basis={marginBasis(report)}
        restsOn={report.restsOn}
        bruise={report.bruise}
      />
      <ReportResults report={report} />
      <section className="space-y-1 text-sm text-stone-700">
        <h2 className="font-semibold">Assumptions</h2>
        <p>{check.assumptions}</p>
      </section>
      <CautionNote machinery />
    </article>
  );
}
