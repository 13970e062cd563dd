import Link from 'next/link';
import { ChartFrame } from '@/components/assessments/chart-frame';
import { PageTitle } from '@/components/ui/page-title';
import { Measure } from '@/components/units/measure';
import { requirePageActor } from '@/lib/auth/session';
import { CHECKS } from '@/lib/checks/registry';
import { overlayCharts, type CheckReport, type Figure } from '@/lib/checks/report';
import { getAssessment, type Assessment } from '@/lib/data/assessments';
import { NotFoundError, ValidationError } from '@/lib/errors';
import { titleFor } from '@/lib/page-title';
import { parseId } from '@/lib/validation/id';

export const generateMetadata = titleFor('assessments:manage-own', 'Compare assessments');

interface Shown {
  a: Assessment;
  name: string;
  report: CheckReport;
}

function Cell({ f }: { f: Figure | undefined }) {
  if (!f) return <>—</>;
  if (f.value === null) return <>{f.text ?? '—'}</>;
  return <Measure value={f.value} unit={f.unit} />;
}

export default async function ComparePage({
  searchParams,
}: {
  searchParams: Promise<{ ids?: string | string[] }>;
}) {
  const actor = await requirePageActor('assessments:manage-own');
  const raw = (await searchParams).ids;
  const ids = [
    ...new Set((Array.isArray(raw) ? raw : (raw ?? '').split(',')).filter(Boolean)),
  ].slice(0, 6);
  const shown: Shown[] = [];
  const problems: string[] = [];
  for (const id of ids) {
    try {
      const a = await getAssessment(actor, parseId(id));
      const first = shown[0]?.a.check;
      if (first && a.check !== first)
        problems.push(
          `${a.title} is a ${CHECKS[a.check].title.toLowerCase()}; only checks of one kind are compared (${CHECKS[first].title.toLowerCase()} first).`,
        );
      else
        shown.push({
          a,
          name: `${a.title} (v${a.version})`,
          report: CHECKS[a.check].show(a.results),
        });
    } catch (error) {
      if (error instanceof NotFoundError || error instanceof ValidationError)
        problems.push(`No assessment ${id.slice(0, 20)} of yours.`);
      else throw error;
    }
  }
  const columns = shown[0] ? [...shown[0].report.scenario, ...shown[0].report.figures] : [];
  const figure = (s: Shown, label: string) =>
    [...s.report.scenario, ...s.report.figures].find((f) => f.label === label);
  return (
    <section className="space-y-6">
      <PageTitle title="Compare assessments">
        Margins, figures and curves of up to six saved checks of one kind side by side.
      </PageTitle>
      {problems.map((p) => (
        <p key={p} className="text-sm text-amber-900">
          {p}
        </p>
      ))}
      {shown.length < 2 ? (
        <p className="text-sm text-stone-600" data-testid="compare-empty">
          Choose two or more assessments of one kind on{' '}
          <Link href="/assessments" className="underline">
            the list
          </Link>{' '}
          to compare them.
        </p>
      ) : (
        <>
          <div className="overflow-x-auto">
            <table className="w-full text-left text-sm" data-testid="compare-table">
              <thead className="text-xs text-stone-600">
                <tr>
                  <th className="py-1 pr-3">Assessment</th>
                  <th className="py-1 pr-3">Bruise margin</th>
                  {columns.map((c) => (
                    <th key={c.label} className="py-1 pr-3">
                      {c.label}
                    </th>
                  ))}
                  <th className="py-1">Data</th>
                </tr>
              </thead>
              <tbody>
                {shown.map((s) => (
                  <tr key={s.a.id} className="border-t border-stone-200 align-top">
                    <td className="py-1 pr-3">
                      <Link href={`/assessments/${s.a.id}`} className="underline">
                        {s.name}
                      </Link>
                    </td>
                    <td className="num py-1 pr-3">
                      {s.report.margin
                        ? `${s.report.margin.value} (${s.report.margin.verdict})`
                        : '—'}
                    </td>
                    {columns.map((c) => (
                      <td key={c.label} className="num py-1 pr-3">
                        <Cell f={figure(s, c.label)} />
                      </td>
                    ))}
                    <td className="py-1 text-xs text-stone-600">
                      {s.a.cultivarName
                        ? `${s.a.cultivarName}, revision ${s.a.revisionNumber}`
                        : 'typed values'}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="grid gap-3 md:grid-cols-2">
            {overlayCharts(shown).map((c) => (
              <ChartFrame key={c.id} spec={c} testId={`compare-${c.id}`} />
            ))}
          </div>
        </>
      )}
    </section>
  );
}
