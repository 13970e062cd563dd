import 'server-only';
import type { MonteCarloResult } from '@/fem';
import type { Actor } from '@/lib/auth/actor';
import { ValidationError } from '@/lib/errors';
import { errorPayload } from '@/lib/http/error-map';
import { parseInput } from '@/lib/validation/parse';
import { probabilityCheckSchema, squeezeCheckSchema } from '@/lib/checks/inputs';
import { checkPool } from '../compute';
import { bodyKey } from './check';
import { toFormError } from './fields';
import { resolveSqueeze, spreadsOf } from './resolve';

const r3 = (v: number | null) => (v === null ? null : Number(v.toPrecision(3)));

function summary(m: MonteCarloResult, without: string[]) {
  return {
    samples: m.samples,
    completed: m.completed,
    seed: m.seed,
    probability: r3(m.probability),
    band_95: m.confidence ? [r3(m.confidence.low), r3(m.confidence.high)] : null,
    nominal_margin: r3(m.nominalMargin),
    margin_quantiles: m.margin && {
      p05: r3(m.margin.p05),
      median: r3(m.margin.median),
      p95: r3(m.margin.p95),
    },
    lifted: m.lifted,
    not_lifted: m.notLifted,
    drivers: m.drivers.map((d) => ({ input: d.input, rank_correlation: r3(d.spearman) })),
    without_spread: without,
    skipped: m.skipped,
    skip_reasons: m.skipReasons,
  };
}

/**
 * The probability of bruising at the grip point from the cultivar's published spreads, as a
 * stream of NDJSON lines: `{ progress }` while it samples, then `{ result }` (or `{ error }`).
 * Inputs are checked before the stream starts, so bad input is a plain 400.
 */
export async function streamSqueezeProbability(
  actor: Actor,
  raw: unknown,
  signal?: AbortSignal,
): Promise<ReadableStream<Uint8Array>> {
  const { samples, seed, ...rest } = (raw ?? {}) as Record<string, unknown>;
  const options = parseInput(probabilityCheckSchema, { samples, seed });
  const input = parseInput(squeezeCheckSchema, { ...rest, sweep: false });
  const resolved = await resolveSqueeze(actor, input);
  const { spreads, without } = spreadsOf(resolved);
  if (!resolved.model.bruiseThreshold) {
    throw new ValidationError('A bruise threshold is needed.', {
      staticThresholdKpa: ['The probability of bruising needs a static bruise threshold.'],
    });
  }
  const encoder = new TextEncoder();
  return new ReadableStream({
    async start(controller) {
      const send = (value: unknown) =>
        controller.enqueue(encoder.encode(`${JSON.stringify(value)}\n`));
      let last = 0;
      try {
        const result = await checkPool().run(
          'squeezeProbability',
          { base: resolved.model, spreads, samples: options.samples, seed: options.seed },
          {
            signal,
            affinity: `${bodyKey(resolved.model)}|${input.mesh}`,
            onProgress: (f) => {
              if (f - last >= 0.05 || f === 1) {
                last = f;
                send({ progress: Number(f.toFixed(3)) });
              }
            },
          },
        );
        send({ result: summary(result, without) });
      } catch (error) {
        if (signal?.aborted) return controller.close();
        const p = errorPayload(toFormError(error, { axialMm: resolved.axialMm }));
        send({ error: p.message, fieldErrors: p.fieldErrors });
      }
      controller.close();
    },
  });
}
