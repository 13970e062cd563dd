import 'server-only';
import { MODEL_VERSION } from '@/fem';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { getAssessment, insertAssessment, type Assessment } from '@/lib/data/assessments';
import { assessmentSchema } from '@/lib/validation/assessments';
import { parseInput } from '@/lib/validation/parse';
import { CHECKS, type CheckName } from './registry';

/** Run a check on the server (never trusting a client's numbers) as an assessment keeps it. */
async function runForAssessment(actor: Actor, check: CheckName, inputs: Record<string, unknown>) {
  const def = CHECKS[check];
  const results = await def.run(actor, inputs);
  return { check, inputs, results, modelVersion: MODEL_VERSION, resultSchema: def.resultSchemaId };
}

/** Save a check: validated, run, and kept with the revision it used and the model's version. */
export async function createAssessment(actor: Actor, input: unknown): Promise<number> {
  assertCan(actor, 'assessments:manage-own');
  const v = parseInput(assessmentSchema, input);
  const run = await runForAssessment(actor, v.check, v.inputs);
  return insertAssessment(actor, run, { title: v.title, notes: v.notes ?? null });
}

/** Re-run with the same inputs on today's published data: the next version of its chain. */
export async function rerunAssessment(actor: Actor, id: number): Promise<number> {
  const old: Assessment = await getAssessment(actor, id);
  const run = await runForAssessment(actor, old.check, old.inputs);
  return insertAssessment(actor, run, { title: old.title, notes: old.notes, rerunOf: old });
}
