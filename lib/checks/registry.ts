import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import type { CheckNameValue } from '@/lib/validation/check-names';
import { runDropCheck } from './drop/check';
import { runSqueezeCheck } from './squeeze/check';
import { runStackCheck } from './stack/check';

export interface CheckDefinition {
  /** Validates its own inputs, runs, and names the revision it pinned. */
  run: (actor: Actor, input: unknown, signal?: AbortSignal) => Promise<{ pinned: unknown }>;
  /** The shape of its saved result: raise it when the result's keys or meanings change. */
  resultSchema: string;
}

/** Every check an assessment can save, one per name of CHECK_NAMES_LIST. */
export const CHECKS = {
  drop: { run: runDropCheck, resultSchema: 'drop/1' },
  stack: { run: runStackCheck, resultSchema: 'stack/1' },
  squeeze: { run: runSqueezeCheck, resultSchema: 'squeeze/1' },
} satisfies Record<CheckNameValue, CheckDefinition>;

export type CheckName = CheckNameValue;
