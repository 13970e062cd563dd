'use client';

import type { ReactNode } from 'react';
import { ChartFrame } from '@/components/assessments/chart-frame';
import { FigureGrid, FigureValue } from '@/components/assessments/report-results';
import type { CheckDescriptor } from '@/lib/checks/report';
import type { Text } from '@/lib/phrase';
import type { CheckNameValue } from '@/lib/validation/check-names';
import { BRUISE_HEADLINE, MarginPanel } from './margin-panel';
import { SaveAssessment } from './save-assessment';
import type { CheckState } from './use-check';
import { CheckWarnings, UsedValues } from './used-values';

/**
 * The working area of every check page: the form on the left; on the right the margin, the
 * result's figures, charts and used values as the check's descriptor describes them (the same
 * ones its saved report shows), the check's own extras, and saving.
 */
export function CheckWorkbench<R>({
  check,
  descriptor,
  state,
  body,
  form,
  basis,
  figuresTestId,
  extras,
  after,
}: {
  check: CheckNameValue;
  descriptor: CheckDescriptor<R>;
  state: CheckState<R>;
  body: Record<string, unknown>;
  form: ReactNode;
  /** What the margin divides, in words. */
  basis: (result: R | null) => Text;
  figuresTestId: string;
  /** Check-specific panels shown after the figures (a table, a picture). */
  extras?: (result: R) => ReactNode;
  /** Shown after the results whether or not there is one (the probability of bruising). */
  after?: ReactNode;
}) {
  const { result, pending } = state;
  const report = result ? descriptor.report(result) : null;
  const lead = report?.figures[0] ?? null;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
      {/* The answer where the eye is: a slim bar that stays in view while the inputs change. */}
      <div
        className="sticky top-0 z-20 -mx-1 flex flex-wrap items-baseline gap-x-4 gap-y-1 rounded-md border border-stone-300 bg-white/95 px-3 py-2 text-sm shadow-sm backdrop-blur lg:col-span-2"
        data-testid="result-bar"
        aria-live="polite"
      >
        {pending ? <span className="text-stone-500">Working…</span> : null}
        {/* The grade's verdict first where the check sizes a bruise; the onset margin beside it. */}
        {report?.bruise ? (
          <span className="font-semibold">{BRUISE_HEADLINE[report.bruise.verdict]}</span>
        ) : null}
        {report?.margin ? (
          <span>
            {report.bruise ? 'Margin at onset' : 'Margin'}{' '}
            <span className="num font-semibold">{report.margin.value}</span> ·{' '}
            {report.margin.verdict}
          </span>
        ) : (
          <span className="text-stone-500">{result ? 'No margin' : 'No result yet'}</span>
        )}
        {lead ? (
          <span>
            {lead.label}:{' '}
            <span className="num">
              <FigureValue f={lead} />
            </span>
          </span>
        ) : null}
      </div>
      {form}
      <div className="min-w-0 space-y-5">
        <MarginPanel
          hasResult={Boolean(result)}
          margin={report?.margin ?? null}
          pending={pending}
          basis={basis(result)}
          restsOn={report?.restsOn}
          bruise={report?.bruise}
        />
        {result && report ? (
          <>
            <CheckWarnings warnings={report.warnings} />
            <FigureGrid figures={report.figures} testId={figuresTestId} />
            {extras?.(result)}
            <div className="grid gap-4 xl:grid-cols-2">
              {report.charts.map((c) => (
                <ChartFrame key={c.id} spec={c} />
              ))}
            </div>
          </>
        ) : (
          <p className="text-sm text-stone-600">Enter the inputs to see the result.</p>
        )}
        {after}
        {report ? <UsedValues rows={report.used.map((u) => [u.label, u.value])} /> : null}
        <SaveAssessment check={check} inputs={body} disabled={!result} />
      </div>
    </div>
  );
}
