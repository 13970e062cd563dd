import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import type { CheckNameValue } from './check-names';
import { runDropCheck } from './drop/check';
import { runSqueezeCheck } from './squeeze/check';
import { runStackCheck } from './stack/check';

type Runner = (actor: Actor, input: unknown) => Promise<{ pinned: unknown }>;

/** Every check an assessment can save, one per name of ./check-names; each validates its inputs. */
export const CHECK_RUNNERS = {
  drop: runDropCheck,
  stack: runStackCheck,
  squeeze: runSqueezeCheck,
} satisfies Record<CheckNameValue, Runner>;

export type CheckName = CheckNameValue;
