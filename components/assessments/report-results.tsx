import { Measure } from '@/components/units/measure';
import { CheckWarnings, UsedValues } from '@/components/checks/used-values';
import type { CheckReport, Figure } from '@/lib/checks/report';
import { ChartFrame } from './chart-frame';

export function FigureValue({ f }: { f: Figure }) {
  if (f.value === null) return <>{f.text ?? '—'}</>;
  return (
    <>
      <Measure value={f.value} unit={f.unit} />
      {f.text ? ` ${f.text}` : null}
    </>
  );
}

export function FigureGrid({ figures, testId }: { figures: Figure[]; testId: string }) {
  return (
    <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4" data-testid={testId}>
      {figures.map((f) => (
        <div key={f.label} className="rounded-md border border-stone-200 bg-white p-2">
          <dt className="text-xs text-stone-600">{f.label}</dt>
          <dd className="num">
            <FigureValue f={f} />
          </dd>
        </div>
      ))}
    </dl>
  );
}

/** A saved check's results exactly as they were computed, from its check's report. */
export function ReportResults({ report }: { report: CheckReport }) {
  return (
    <div className="space-y-4">
      <CheckWarnings warnings={report.warnings} />
      <section className="space-y-2">
        <h2 className="text-sm font-semibold">Scenario</h2>
        <FigureGrid figures={report.scenario} testId="report-scenario" />
      </section>
      <section className="space-y-2">
        <h2 className="text-sm font-semibold">Results</h2>
        <FigureGrid figures={report.figures} testId="report-figures" />
      </section>
      <div className="grid gap-4 lg:grid-cols-2">
        {report.charts.map((c) => (
          <ChartFrame key={c.id} spec={c} />
        ))}
      </div>
      <UsedValues rows={report.used.map((u) => [u.label, u.value])} />
    </div>
  );
}
