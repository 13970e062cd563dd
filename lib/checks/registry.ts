import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { runDropCheck } from './drop';
import { runSqueezeCheck } from './squeeze';
import { runStackCheck } from './stack';

/** Every check an assessment can save, by name; each validates its own inputs. */
export const CHECK_RUNNERS = {
  drop: runDropCheck,
  stack: runStackCheck,
  squeeze: runSqueezeCheck,
} satisfies Record<string, (actor: Actor, input: unknown) => Promise<{ pinned: unknown }>>;

export type CheckName = keyof typeof CHECK_RUNNERS;
export const CHECK_NAMES = Object.keys(CHECK_RUNNERS) as CheckName[];

// The plain list in ./check-names must name the same checks (checked at compile time).
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : never) : never;
export const CHECK_LISTS_AGREE: Same<CheckName, import('./check-names').CheckNameValue> = true;
