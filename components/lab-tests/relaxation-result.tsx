'use client';

import { useUnits } from '@/components/units/units-provider';
import type { RelaxationTestRecord } from '@/lib/data/relaxation-tests';
import type { RelaxationPlot } from '@/lib/lab-tests/relaxation-plot';
import { Figure } from './figure';
import { dateText, sig } from './format';
import { RelaxationChart } from './relaxation-chart';
import { TestDraftPanel } from './test-draft-panel';

/** R² of the force curve below this means the readings leave Peleg's form. */
const WEAK_FIT = 0.95;

const percent = (share: number) => `${sig(share * 100)} %`;

function conditions(test: RelaxationTestRecord): string {
  const parts = [test.specimen];
  if (test.loadingRate) parts.push(`loaded at ${test.loadingRate}`);
  if (test.temperatureC !== null) parts.push(`at ${test.temperatureC} °C`);
  return parts.join(', ');
}

/** A relaxation test's fit in words and figures, its chart, and a way to a draft. */
export function RelaxationResult({
  test,
  plot,
  pointsUsed,
  canDraft,
}: {
  test: RelaxationTestRecord;
  plot: RelaxationPlot;
  pointsUsed: number | null;
  canDraft: boolean;
}) {
  const { show } = useUnits();
  const kept = plot.retained;
  const last = kept.at(-1)!;
  return (
    <section
      id="relaxation-result"
      aria-labelledby="relaxation-result-title"
      data-testid="relaxation-result"
      className="scroll-mt-4 space-y-4 rounded-lg border border-stone-200 bg-stone-50 p-3 sm:p-4"
    >
      <h3 id="relaxation-result-title" className="font-semibold text-stone-900">
        Relaxation test #{test.id}: {test.cultivar.commodityName} — {test.cultivar.name}
      </h3>
      {test.isDemo ? (
        <p className="rounded-md bg-clay-50 px-3 py-2 text-sm text-clay-700">
          Demo upload: invented readings, not a measurement. A draft from it cites a demo source.
        </p>
      ) : null}
      <p className="text-sm text-stone-700" data-testid="relaxation-words">
        Held at {sig(test.deformationMm)} mm plate travel ({conditions(test)}), the force fell from{' '}
        {show(test.f0N, 'N')} at t = 0 to {show(test.f0N * last.share, 'N')} after {last.timeS} s on
        the fitted curve. Peleg&apos;s fit gives k₁ = {sig(test.k1S)} s: at first the force falls by
        1 ÷ k₁ = {percent(1 / test.k1S)} of F₀ a second. And k₂ = {sig(test.k2)}: in the long run 1
        ÷ k₂ = {percent(1 / test.k2)} of the force relaxes and {percent(1 - 1 / test.k2)} stays
        held.
      </p>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        <Figure label="k₁ (s)" value={sig(test.k1S)} testId="relaxation-k1" />
        <Figure label="k₂ (–)" value={sig(test.k2)} testId="relaxation-k2" />
        <Figure
          label="R² of the force fit"
          value={test.r2Force.toFixed(4)}
          testId="relaxation-r2"
        />
        <Figure label="Force at t = 0" value={show(test.f0N, 'N')} testId="relaxation-f0" />
        {kept.map((k) => (
          <Figure
            key={k.timeS}
            label={`Force kept after ${k.timeS} s`}
            value={percent(k.share)}
            testId={`relaxation-kept-${k.timeS}`}
          />
        ))}
      </dl>
      {test.r2Force < WEAK_FIT ? (
        <p className="rounded-md bg-clay-50 px-3 py-2 text-sm text-clay-700">
          R² is below {WEAK_FIT}: the readings depart from Peleg&apos;s form. Check that the file
          starts at the end of loading and holds the hold only.
        </p>
      ) : null}
      {plot.measured.length > 0 ? (
        <RelaxationChart plot={plot} />
      ) : (
        <p className="rounded-md bg-clay-50 px-3 py-2 text-sm text-clay-700">
          The stored file could not be read back, so the readings cannot be drawn; the figures above
          are those recorded at upload.
        </p>
      )}
      <p className="text-sm text-stone-600">
        Fitted: t·F₀ ÷ (F₀ − F) against t by least squares, Peleg&apos;s linear form (R² ={' '}
        {test.r2Linear.toFixed(4)}){pointsUsed === null ? '' : `, ${pointsUsed} readings`}. File{' '}
        <span className="wrap-anywhere">{test.fileName}</span>, {test.rows} rows; uploaded by{' '}
        {test.uploadedBy.name} on {dateText(test.createdAt)}.
      </p>
      {canDraft ? (
        <TestDraftPanel
          draftRevisionId={test.draftRevisionId}
          startedFrom="test"
          endpoint={`/api/relaxation-tests/${test.id}/draft`}
          label="Start a draft"
        />
      ) : null}
    </section>
  );
}
