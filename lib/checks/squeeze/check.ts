import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { parseInput } from '@/lib/validation/parse';
import { squeezeCheckSchema } from '@/lib/checks/inputs';
import { checkPool } from '../compute';
import type { TaskAnswer } from '@/lib/compute/task-table';
import type { CheckTasks } from '../tasks';
import { chooseGradeRule } from '@/lib/data/grade-rules';
import { judgeBruise, radiusAbove, ruleView, type BruiseView } from '../bruise';
import { toFormError } from './fields';
import { squeezeHead } from './head';
import { resolveSqueeze, sweepDiameters } from './resolve';

export type SqueezeCheckResult = TaskAnswer<CheckTasks, 'squeezeCheck'> & {
  bruise?: BruiseView | null;
};

/** The cache key of the model's unit body (shape, ν, mesh): runs of one body share a thread. */
export function bodyKey(m: { equatorialRadius: number; axialRadius?: number; poisson: number }) {
  const aspect = (m.axialRadius ?? m.equatorialRadius) / m.equatorialRadius;
  return `${aspect.toPrecision(6)}|${m.poisson}`;
}

/**
 * The squeeze check: two opposed pads grip the fruit; the finite-element squeeze (in a worker
 * thread) finds the travel at which the grip lifts it, and the bruise margin there. A refusal of
 * the model becomes a 400 on the form's field.
 */
export async function runSqueezeCheck(
  actor: Actor,
  raw: unknown,
  signal?: AbortSignal,
): Promise<SqueezeCheckResult> {
  const input = parseInput(squeezeCheckSchema, raw);
  const r = await resolveSqueeze(actor, input);
  const pinned = r.fruit.pinned;
  const grade = await chooseGradeRule(pinned?.commodityId ?? null, input.gradeRule);
  try {
    const result = await checkPool().run(
      'squeezeCheck',
      {
        input: r.model,
        sweep: input.sweep ? sweepDiameters(input, r.fruit.diameterMm.value) : null,
        move: {
          verticalMs2: input.accelerationMs2,
          horizontalMs2: input.horizontalAccelerationMs2,
          offsetMm: input.gripOffsetMm,
        },
        hold:
          input.holdSeconds === undefined
            ? null
            : {
                seconds: input.holdSeconds,
                relaxation: r.relaxation
                  ? { k1: r.relaxation.k1.value, k2: r.relaxation.k2.value }
                  : null,
              },
        head: squeezeHead(r, input),
        inputWarnings: [
          ...r.fruit.warnings,
          ...(r.fruit.staticThresholdKpa
            ? []
            : ['No static bruise threshold on any rung: enter one to get a bruise margin.']),
        ],
      },
      { signal, affinity: `${bodyKey(r.model)}|${input.mesh}` },
    );
    const threshold = r.fruit.staticThresholdKpa?.value;
    // The bruise at the grip point: the surface region where the FE contact pressure exceeds
    // the threshold, judged against the grade rule (the onset margin stays beside it).
    const bruise =
      threshold && result.grip_profile
        ? judgeBruise(
            radiusAbove(result.grip_profile, threshold),
            grade && ruleView(grade, pinned?.commodity ?? null),
          )
        : null;
    return { ...result, bruise };
  } catch (error) {
    throw toFormError(error, { axialMm: r.axialMm });
  }
}
