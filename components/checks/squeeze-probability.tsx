'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';

interface ProbabilityResult {
  samples: number;
  completed: number;
  probability: number | null;
  band_95: [number, number] | null;
  nominal_margin: number | null;
  lifted: number;
  not_lifted: number;
  drivers: { input: string; rank_correlation: number }[];
  without_spread: string[];
}

const NAMES: Record<string, string> = {
  modulus: "Young's modulus",
  poisson: "Poisson's ratio",
  size: 'fruit size',
  density: 'density',
  friction: 'friction',
  bruiseThreshold: 'bruise threshold',
};

/** Samples the inputs' evidence spreads on the server, showing progress as it streams. */
export function SqueezeProbability({
  body,
  disabled,
}: {
  body: Record<string, unknown>;
  disabled: boolean;
}) {
  const [progress, setProgress] = useState<number | null>(null);
  const [result, setResult] = useState<ProbabilityResult | null>(null);
  const [error, setError] = useState<string | null>(null);
  async function run() {
    setProgress(0);
    setResult(null);
    setError(null);
    const res = await fetch('/api/checks/squeeze/probability', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ ...body, samples: 1000, seed: 1 }),
    });
    if (!res.ok || !res.body) {
      const json = await res.json().catch(() => ({}));
      setProgress(null);
      return setError(
        [json.message, ...Object.values(json.fieldErrors ?? {}).flat()].filter(Boolean).join(' ') ||
          'The estimate failed.',
      );
    }
    const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
    let buffer = '';
    for (;;) {
      const { value, done } = await reader.read();
      if (done) break;
      buffer += value;
      const lines = buffer.split('\n');
      buffer = lines.pop() ?? '';
      for (const line of lines.filter(Boolean)) {
        const msg = JSON.parse(line);
        if (typeof msg.progress === 'number') setProgress(msg.progress);
        if (msg.result) setResult(msg.result);
        if (msg.error) setError(msg.error);
      }
    }
    setProgress(null);
  }
  return (
    <section
      className="space-y-2 rounded-lg border border-stone-200 bg-white p-3"
      data-testid="probability"
    >
      <h3 className="text-sm font-medium">Probability of bruising</h3>
      <p className="text-xs text-stone-600">
        1 000 samples of the inputs, each within the spread its evidence gives (listed with each
        input used: its source&apos;s own spread; for an inherited value the spread across the
        commodity&apos;s records; for a derived one its inputs&apos; spreads carried through; for a
        typical value a wide stated band; a typed figure is held exact). A range counts as ±2
        standard deviations; positive values are log-normal. Weaker evidence widens the band.
      </p>
      <Button
        type="button"
        variant="secondary"
        onClick={() => void run()}
        disabled={disabled || progress !== null}
      >
        {progress !== null ? 'Sampling…' : 'Estimate the probability of bruising'}
      </Button>
      {progress !== null ? (
        <div
          role="progressbar"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={Math.round(progress * 100)}
          className="h-2 w-full rounded bg-stone-200"
        >
          <div
            className="h-2 rounded bg-leaf-600"
            style={{ width: `${Math.round(progress * 100)}%` }}
          />
        </div>
      ) : null}
      {error ? (
        <p className="text-sm text-red-700" aria-live="polite">
          {error}
        </p>
      ) : null}
      {result ? (
        <div className="space-y-1 text-sm" data-testid="probability-result" aria-live="polite">
          <p>
            P(margin &lt; 1) ={' '}
            <strong className="num">
              {result.probability === null ? '—' : `${(result.probability * 100).toFixed(1)} %`}
            </strong>
            {result.band_95 ? (
              <span className="text-stone-600">
                {' '}
                (95 % band {(result.band_95[0] * 100).toFixed(1)}–
                {(result.band_95[1] * 100).toFixed(1)} %)
              </span>
            ) : null}{' '}
            over {result.lifted} lifted samples
            {result.not_lifted ? `; ${result.not_lifted} were not lifted within the travel` : ''}.
          </p>
          {result.drivers.length ? (
            <p>
              What drives it:{' '}
              {result.drivers
                .map((d) => `${NAMES[d.input] ?? d.input} (rank correlation ${d.rank_correlation})`)
                .join(', ')}
              .
            </p>
          ) : null}
          {result.without_spread.length ? (
            <p className="text-xs text-stone-600">
              No spread on its rung, held at the nominal value: {result.without_spread.join(', ')}.
            </p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
