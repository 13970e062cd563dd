import Link from 'next/link';
import { CompareChart } from '@/components/assessments/compare-charts';
import { PageTitle } from '@/components/ui/page-title';
import { Measure } from '@/components/units/measure';
import { requirePageActor } from '@/lib/auth/session';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';
import { getAssessment, type Assessment } from '@/lib/data/assessments';
import { NotFoundError, ValidationError } from '@/lib/errors';
import { titleFor } from '@/lib/page-title';
import { parseId } from '@/lib/validation/id';

export const generateMetadata = titleFor('assessments:manage-own', 'Compare assessments');

type Squeeze = Assessment & { results: SqueezeCheckResult };

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
  const found: Squeeze[] = [];
  const problems: string[] = [];
  for (const id of ids) {
    try {
      const a = await getAssessment(actor, parseId(id));
      if (a.check === 'squeeze') found.push(a as Squeeze);
      else problems.push(`${a.title} is a ${a.check} check; only squeeze checks are compared.`);
    } catch (error) {
      if (error instanceof NotFoundError || error instanceof ValidationError)
        problems.push(`No assessment ${id.slice(0, 20)} of yours.`);
      else throw error;
    }
  }
  const name = (a: Squeeze) => `${a.title} (v${a.version})`;
  const grip = (a: Squeeze) =>
    a.results.model.liftability?.grip as Record<string, number | null> | null | undefined;
  return (
    <section className="space-y-6">
      <PageTitle title="Compare squeeze assessments">
        Margins, grip forces and curves of up to six saved squeeze checks side by side.
      </PageTitle>
      {problems.map((p) => (
        <p key={p} className="text-sm text-amber-900">
          {p}
        </p>
      ))}
      {found.length < 2 ? (
        <p className="text-sm text-stone-600" data-testid="compare-empty">
          Choose two or more squeeze assessments on{' '}
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
                  <th className="py-1 pr-3">Grip force per pad</th>
                  <th className="py-1 pr-3">Peak pressure at the grip</th>
                  <th className="py-1 pr-3">Pad</th>
                  <th className="py-1">Data</th>
                </tr>
              </thead>
              <tbody>
                {found.map((a) => (
                  <tr key={a.id} className="border-t border-stone-200 align-top">
                    <td className="py-1 pr-3">
                      <Link href={`/assessments/${a.id}`} className="underline">
                        {name(a)}
                      </Link>
                    </td>
                    <td className="num py-1 pr-3">
                      {a.results.margin
                        ? `${a.results.margin.value} (${a.results.margin.verdict})`
                        : '—'}
                    </td>
                    <td className="py-1 pr-3">
                      {grip(a)?.force_n != null ? (
                        <Measure value={grip(a)!.force_n!} unit="N" />
                      ) : (
                        'not lifted'
                      )}
                    </td>
                    <td className="py-1 pr-3">
                      {grip(a)?.peak_pressure_kpa != null ? (
                        <Measure value={grip(a)!.peak_pressure_kpa!} unit="kPa" />
                      ) : (
                        '—'
                      )}
                    </td>
                    <td className="py-1 pr-3">
                      {a.results.inputs_used.pad_diameter_mm ? (
                        <Measure value={a.results.inputs_used.pad_diameter_mm} unit="mm" />
                      ) : (
                        'flat plates'
                      )}
                      , {a.results.inputs_used.facing}
                    </td>
                    <td className="py-1 text-xs text-stone-600">
                      {a.cultivarName
                        ? `${a.cultivarName}, revision ${a.revisionNumber}`
                        : 'typed values'}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="grid gap-3 md:grid-cols-2">
            <CompareChart
              testId="compare-force"
              title="Pad force against travel"
              x={['travel per pad', 'mm']}
              y={['force', 'N']}
              series={found.map((a) => ({
                name: name(a),
                points: (a.results.model.steps as unknown as Record<string, number>[]).map((s) => ({
                  x: s.travel_per_pad_mm,
                  y: s.force_n,
                })),
              }))}
            />
            <CompareChart
              testId="compare-sweep"
              title="Bruise margin against pad diameter"
              x={['pad diameter', 'mm']}
              y={['margin', '–']}
              series={found
                .filter((a) => a.results.sweep)
                .map((a) => ({
                  name: name(a),
                  points: a.results
                    .sweep!.points.filter((p) => p.bruise_margin !== null)
                    .map((p) => ({ x: p.pad_diameter_mm!, y: p.bruise_margin! })),
                }))}
            />
          </div>
        </>
      )}
    </section>
  );
}
