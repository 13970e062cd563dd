'use server';

import { revalidatePath } from 'next/cache';
import { redirect } from 'next/navigation';
import { z } from 'zod';
import { requireActor } from '@/lib/auth/session';
import {
  createDraft,
  publishRevision,
  rebaseDraft,
  returnRevision,
  submitDraft,
  updateDraft,
} from '@/lib/data/revisions';
import { resolveConflict } from '@/lib/data/revision-conflicts';
import { createSource } from '@/lib/data/revision-sources';
import { ValidationError } from '@/lib/errors';
import { slugSchema } from '@/lib/validation/cultivars';
import { formObject } from '@/lib/validation/form';
import { idSchema } from '@/lib/validation/id';
import { parseInput } from '@/lib/validation/parse';
import { draftInputOf, formFieldErrors, isFormFieldName } from '@/lib/validation/revision-form';
import { runAction, type ActionState } from './state';

const revisionIdSchema = z.object({ revisionId: idSchema });
const startSchema = z.object({ cultivar: slugSchema });
const intentSchema = z.enum(['save', 'submit']).catch('save');

function refresh(id: number) {
  revalidatePath('/editor');
  revalidatePath(`/editor/revisions/${id}`);
}

/** What to put back into the draft form after an error: its own fields only. */
function typedValues(fields: Record<string, string>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [name, value] of Object.entries(fields)) {
    if (name === 'summary' || isFormFieldName(name)) out[name] = value;
  }
  return out;
}

/** Start a draft of a cultivar ("cultivar": its slug) and open it for editing. */
export async function createDraftAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  let id = 0;
  const state = await runAction(async () => {
    const actor = await requireActor('revisions:edit');
    const { cultivar } = parseInput(startSchema, formObject(form));
    ({ id } = await createDraft(actor, cultivar));
    revalidatePath('/editor');
    return `Draft started.`;
  });
  if (state.ok) redirect(`/editor/revisions/${id}`);
  return state;
}

/**
 * Save a draft from its form (`summary`, `values.<i>.<field>`, hidden `revisionId`); with
 * `intent=submit` it is then submitted for review. Errors come back keyed by the form's own
 * field names, with everything typed.
 */
export async function updateDraftAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const fields = formObject(form);
  const { input, order } = draftInputOf(fields);
  const state = await runAction(async () => {
    const actor = await requireActor('revisions:edit');
    const { revisionId } = parseInput(revisionIdSchema, fields);
    try {
      await updateDraft(actor, revisionId, input);
    } catch (error) {
      if (!(error instanceof ValidationError)) throw error;
      throw new ValidationError(
        'Some fields need attention: see the messages beside them.',
        formFieldErrors(error.fieldErrors, order),
      );
    }
    refresh(revisionId);
    if (intentSchema.parse(fields.intent) === 'save') return 'Draft saved.';
    await submitDraft(actor, revisionId);
    return 'Saved and submitted: another editor will review it.';
  });
  return state.ok ? state : { ...state, values: typedValues(fields) };
}

/**
 * Move a draft onto the cultivar's current published revision by a three-way merge: what only
 * the published revision changed is carried in; what both changed waits as a conflict.
 */
export async function rebaseDraftAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('revisions:edit');
    const { revisionId } = parseInput(revisionIdSchema, formObject(form));
    const outcome = await rebaseDraft(actor, revisionId);
    refresh(revisionId);
    const carried = outcome.carried.length
      ? ` Carried in from it: ${outcome.carried.join(', ')}.`
      : ' Nothing else changed in it.';
    const conflicts = outcome.conflicts
      ? ` ${outcome.conflicts === 1 ? 'One value' : `${outcome.conflicts} values`} changed on both sides: decide each below before submitting.`
      : '';
    return `Rebased on ${outcome.onto}.${carried}${conflicts}`;
  });
}

/** Decide one conflict of a rebased draft: `conflictId`, `choice` = mine | theirs. */
export async function resolveConflictAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('revisions:edit');
    const fields = formObject(form);
    const { revisionId } = parseInput(revisionIdSchema, fields);
    const { left } = await resolveConflict(actor, revisionId, fields);
    refresh(revisionId);
    const rest = left
      ? ` ${left} left to decide.`
      : ' No conflict left: the draft can be submitted.';
    return `${fields.choice === 'theirs' ? 'Took the published value.' : 'Kept yours.'}${rest}`;
  });
}

/** Add a source from the draft page (`key`, `kind`, `title`, …); it is then in the source lists. */
export async function createSourceAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const fields = formObject(form);
  const state = await runAction(async () => {
    const actor = await requireActor('revisions:edit');
    const { revisionId } = parseInput(revisionIdSchema, fields);
    const { key } = await createSource(actor, fields);
    refresh(revisionId);
    return `Source "${key}" added: choose it in a value's Source list.`;
  });
  // A plain copy: the form's fields are a null-prototype object, which cannot reach the client.
  return state.ok ? state : { ...state, values: { ...fields } };
}

/** Publish another editor's revision in review; a stale base answers 409 naming the newer one. */
export async function publishRevisionAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('revisions:review');
    const { revisionId } = parseInput(revisionIdSchema, formObject(form));
    await publishRevision(actor, revisionId);
    refresh(revisionId);
    revalidatePath('/properties', 'layout');
    return 'Published: followers of this cultivar are being e-mailed.';
  });
}

/** Send a revision in review back to its author with a comment ("comment", required). */
export async function returnRevisionAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  const fields = formObject(form);
  const state = await runAction(async () => {
    const actor = await requireActor('revisions:review');
    const { revisionId } = parseInput(revisionIdSchema, fields);
    await returnRevision(actor, revisionId, { comment: fields.comment ?? '' });
    refresh(revisionId);
    return 'Returned to the author with your comment.';
  });
  return state.ok ? state : { ...state, values: { comment: fields.comment ?? '' } };
}
