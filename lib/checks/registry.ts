import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import type { CheckNameValue } from '@/lib/validation/check-names';
import { runDropCheck } from './drop/check';
import { dropDescriptor } from './drop/report';
import type { CheckDescriptor, CheckReport } from './report';
import { runSqueezeCheck } from './squeeze/check';
import { squeezeDescriptor } from './squeeze/report';
import { runStackCheck } from './stack/check';
import { stackDescriptor } from './stack/report';
import type { PinnedSummary } from './used-value';

/** A check as saving and every saved-result view see it, its result type closed over. */
export interface RegisteredCheck {
  title: string;
  resultSchemaId: string;
  assumptions: string;
  /** Validates its own inputs, runs, and names the revision it pinned. */
  run(actor: Actor, input: unknown, signal?: AbortSignal): Promise<{ pinned: PinnedSummary }>;
  /** A saved result read back through the check's schema, as the report shows it. */
  show(results: unknown): CheckReport;
}

/** One check's line in the registry: its descriptor (report, schema) and its runner. */
export function defineCheck<R extends { pinned: PinnedSummary }>(
  descriptor: CheckDescriptor<R>,
  run: (actor: Actor, input: unknown, signal?: AbortSignal) => Promise<R>,
): RegisteredCheck {
  return {
    title: descriptor.title,
    resultSchemaId: descriptor.resultSchemaId,
    assumptions: descriptor.assumptions,
    run,
    show: (results) => descriptor.report(descriptor.resultSchema.parse(results)),
  };
}

/**
 * Every check an assessment can save, one line each. Saving, the report view, the PDF, the
 * curves CSV and the comparison all go through this; a name of CHECK_NAMES_LIST without its
 * line here fails to compile.
 */
export const CHECKS = {
  drop: defineCheck(dropDescriptor, runDropCheck),
  stack: defineCheck(stackDescriptor, runStackCheck),
  squeeze: defineCheck(squeezeDescriptor, runSqueezeCheck),
} satisfies Record<CheckNameValue, RegisteredCheck>;

export type CheckName = CheckNameValue;
