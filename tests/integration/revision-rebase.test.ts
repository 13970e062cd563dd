import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import '../support/session';
import { freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { getRevision } from '@/lib/data/cultivars';
import {
  createDraft,
  publishRevision,
  rebaseDraft,
  submitDraft,
  updateDraft,
} from '@/lib/data/revisions';
import { listConflicts, resolveConflict } from '@/lib/data/revision-conflicts';
import { listOtherOpenRevisions } from '@/lib/data/revision-others';
import { valueFieldsOf, draftInputOf } from '@/lib/validation/revision-form';

const SLUG = 'pear-williams';
let admin: Actor, editor: Actor, editor2: Actor;

/** A published-style threshold a lab editor would type, citing a seeded source. */
const threshold = (value: number) => ({
  quantity: 'static_bruise_threshold',
  value,
  sourceKey: 'tjaf-pear-apple-storage',
  method: 'Flat plate held on whole fruit',
});

/** The draft's current values, as its form would send them back (a full replacement). */
async function formValues(actor: Actor, id: number) {
  const fields = Object.fromEntries(
    (await getRevision(actor, id)).values.flatMap((v, i) =>
      Object.entries(valueFieldsOf(v)).map(([k, x]) => [`values.${i}.${k}`, x]),
    ),
  );
  return draftInputOf(fields).input.values as unknown[];
}

const thresholds = async (id: number) =>
  (await getRevision(admin, id)).values
    .filter((v) => v.quantity === 'static_bruise_threshold')
    .map((v) => v.value);

/** The seeded demo: editor2's revision 2 of Williams, in review, based on revision 1. */
async function demoRevision() {
  const cultivar = await db('cultivars').where({ slug: SLUG }).first();
  return db('property_revisions').where({ cultivar_id: cultivar.id, number: 2 }).first();
}

describe('rebasing a draft is a three-way merge (the Williams case)', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    const actor = async (email: string) => (await getActiveActor(await userId(email)))!;
    admin = await actor(ACCOUNTS.admin);
    editor = await actor(ACCOUNTS.editor);
    editor2 = await actor('editor2@kestrelvale.example');
  });
  afterAll(() => catcher.close());

  it('starting a draft names the other open revision of the cultivar', async () => {
    const demo = await demoRevision();
    expect(demo.status).toBe('in_review');
    const { id, otherOpen } = await createDraft(editor, SLUG);
    expect(otherOpen).toEqual([{ number: 2, status: 'in_review', authorName: 'Ilse Brandt' }]);
    const draft = await getRevision(editor, id);
    expect(draft.number).toBe(3);
    expect(await listOtherOpenRevisions(editor, draft)).toEqual(otherOpen);
  });

  it('revision 3 publishes 120 kPa; rebasing revision 2 keeps its modulus and carries 120 kPa in', async () => {
    const three = (await db('property_revisions')
      .where({ number: 3, author_id: editor.id })
      .first())!.id as number;
    await updateDraft(editor, three, {
      summary: 'Adds a static threshold',
      values: [...(await formValues(editor, three)), threshold(120)],
    });
    await submitDraft(editor, three);
    await publishRevision(admin, three);

    const demo = await demoRevision();
    const before = (await getRevision(editor2, demo.id)).values;
    const outcome = await rebaseDraft(editor2, demo.id);
    expect(outcome).toMatchObject({ onto: 'revision 3', conflicts: 0 });
    expect(outcome.carried).toEqual(['Static bruise threshold']);
    const after = await getRevision(editor2, demo.id);
    expect(after.status).toBe('draft');
    expect(await thresholds(demo.id)).toEqual([120]);
    // The draft's own change, the demo's 1.42 MPa apparent modulus, is still there.
    const moduli = (vs: typeof before) =>
      vs.filter((v) => v.quantity === 'youngs_modulus').map((v) => v.value);
    expect(moduli(after.values)).toEqual(moduli(before));
    expect(moduli(after.values)).toContain(1.42);
    expect(await listConflicts(editor2, demo.id)).toEqual([]);
    // Submitted again and published over revision 3, the threshold survives.
    await submitDraft(editor2, demo.id);
    await publishRevision(editor, demo.id);
    expect(await thresholds(demo.id)).toEqual([120]);
  });

  it('a value both sides changed is a conflict: submission is a 400 until it is decided', async () => {
    const mine = (await createDraft(editor, SLUG)).id;
    const theirs = (await createDraft(editor2, SLUG)).id;
    const replaceThreshold = async (actor: Actor, id: number, value: number) => {
      const values = (await formValues(actor, id)).filter(
        (v) => (v as { quantity: string }).quantity !== 'static_bruise_threshold',
      );
      await updateDraft(actor, id, { values: [...values, threshold(value)] });
    };
    await replaceThreshold(editor2, theirs, 130);
    await submitDraft(editor2, theirs);
    await publishRevision(admin, theirs);

    await replaceThreshold(editor, mine, 110);
    const outcome = await rebaseDraft(editor, mine);
    expect(outcome.conflicts).toBe(1);
    const [conflict] = await listConflicts(editor, mine);
    expect(conflict).toMatchObject({
      label: 'Static bruise threshold',
      base: { value: 120 },
      mine: { value: 110 },
      theirs: { value: 130 },
    });
    expect(conflict.theirs?.source?.key).toBe('tjaf-pear-apple-storage');

    const refused = await submitDraft(editor, mine).catch((e) => e);
    expect(refused.status).toBe(400);
    expect(refused.message).toMatch(/Decide the conflict with the published revision first/);
    expect((await db('property_revisions').where({ id: mine }).first()).status).toBe('draft');

    // Only the author decides, and only with a known choice.
    await expect(
      resolveConflict(editor2, mine, { conflictId: conflict.id, choice: 'theirs' }),
    ).rejects.toMatchObject({ status: 403 });
    const bad = await resolveConflict(editor, mine, {
      conflictId: conflict.id,
      choice: 'both',
    }).catch((e) => e);
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.fieldErrors)).toContain('choice');

    expect(
      await resolveConflict(editor, mine, { conflictId: conflict.id, choice: 'theirs' }),
    ).toMatchObject({ left: 0 });
    expect(await thresholds(mine)).toEqual([130]);
    await submitDraft(editor, mine);
    const audit = await db('audit_log').where({ action: 'revision.resolve' }).first();
    expect(JSON.parse(audit.detail)).toEqual({
      value: 'Static bruise threshold',
      choice: 'theirs',
    });
  });

  it('keep mine leaves the draft value as it was', async () => {
    const mine = (await createDraft(editor, SLUG)).id;
    const other = (await createDraft(editor2, SLUG)).id;
    const set = async (actor: Actor, id: number, value: number) => {
      const values = (await formValues(actor, id)).filter(
        (v) => (v as { quantity: string }).quantity !== 'static_bruise_threshold',
      );
      await updateDraft(actor, id, { values: [...values, threshold(value)] });
    };
    // The revision in review from the previous case is published first; both start after it.
    const { cultivar_id } = await demoRevision();
    const inReview = await db('property_revisions').where({ cultivar_id, status: 'in_review' });
    expect(inReview).toHaveLength(1);
    await publishRevision(editor2, inReview[0].id);
    await rebaseDraft(editor, mine);
    await rebaseDraft(editor2, other);
    await set(editor2, other, 140);
    await submitDraft(editor2, other);
    await publishRevision(admin, other);
    await set(editor, mine, 100);
    await rebaseDraft(editor, mine);
    const [conflict] = await listConflicts(editor, mine);
    await resolveConflict(editor, mine, { conflictId: conflict.id, choice: 'mine' });
    expect(await thresholds(mine)).toEqual([100]);
    expect(await listConflicts(editor, mine)).toEqual([]);
  });
});
