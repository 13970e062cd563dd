import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestCatcher, waitForMail } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { getCultivar, getRevision, listRevisions } from '@/lib/data/cultivars';
import { setFollowing } from '@/lib/data/follows';
import {
  createDraft,
  publishRevision,
  rebaseDraft,
  returnRevision,
  submitDraft,
  updateDraft,
} from '@/lib/data/revisions';
import { listConflicts, resolveConflict } from '@/lib/data/revision-conflicts';

const SLUG = 'apple-jonathan';
let admin: Actor, editor: Actor, editor2: Actor, engineer: Actor, buyer: Actor;

/** A value an editor would type: Jonathan flesh modulus from the seeded thesis source. */
const modulus = (value: number) => ({
  quantity: 'youngs_modulus',
  variant: 'flesh',
  value,
  sourceKey: 'shahabasi-1979',
  method: 'Flesh cylinders in compression',
});

async function inReview(author: Actor, value: number) {
  const { id } = await createDraft(author, SLUG);
  await updateDraft(author, id, { summary: `modulus ${value}`, values: [modulus(value)] });
  await submitDraft(author, id);
  return id;
}

const statusOf = async (id: number) =>
  (await db('property_revisions').where({ id }).first()).status;

describe('revision workflow', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    const actor = async (email: string) => (await getActiveActor(await userId(email)))!;
    admin = await actor(ACCOUNTS.admin);
    editor = await actor(ACCOUNTS.editor);
    editor2 = await actor('editor2@kestrelvale.example');
    engineer = await actor(ACCOUNTS.engineer);
    buyer = await actor(ACCOUNTS.buyer);
  });
  afterAll(() => catcher.close());
  beforeEach(async () => {
    // Nothing else in review between cases: drafts of earlier cases are simply left behind.
  });

  it('a draft starts as a copy of the published revision and names it as its base', async () => {
    const published = (await getCultivar(engineer, SLUG)).published!;
    const { id } = await createDraft(editor, SLUG);
    const draft = await getRevision(editor, id);
    expect(draft.status).toBe('draft');
    expect(draft.basedOnId).toBe(published.id);
    expect(draft.values.map((v) => [v.quantity, v.value])).toEqual(
      (await getCultivar(engineer, SLUG)).values.map((v) => [v.quantity, v.value]),
    );
  });

  it('engineers and buyers may not draft; only the author edits or submits', async () => {
    await expect(createDraft(engineer, SLUG)).rejects.toMatchObject({ status: 403 });
    await expect(createDraft(buyer, SLUG)).rejects.toMatchObject({ status: 403 });
    const { id } = await createDraft(editor, SLUG);
    await expect(updateDraft(editor2, id, { values: [modulus(2)] })).rejects.toMatchObject({
      status: 403,
    });
    await expect(submitDraft(editor2, id)).rejects.toMatchObject({ status: 403 });
  });

  it('bad values are refused with field messages and nothing changes', async () => {
    const { id } = await createDraft(editor, SLUG);
    const before = await countRows('revision_values');
    const cases: [unknown, string][] = [
      [{ ...modulus(2), value: 'abc' }, 'values.0.value'],
      [{ ...modulus(2), value: -1 }, 'values.0.value'],
      [{ ...modulus(2), variant: 'steel' }, 'values.0.variant'],
      [{ ...modulus(2), low: 3, high: 4 }, 'values.0.low'],
      [{ ...modulus(2), low: 1 }, 'values.0.high'],
      [{ ...modulus(2), sourceKey: null }, 'values.0.sourceKey'],
      [{ ...modulus(2), sourceKey: 'no-such-source' }, 'values.0.sourceKey'],
      [{ ...modulus(2), quantity: '__proto__' }, 'values.0.quantity'],
      [{ quantity: 'poisson_ratio', value: 0.5, sourceKey: 'shahabasi-1979' }, 'values.0.value'],
    ];
    for (const [value, field] of cases) {
      const error = await updateDraft(editor, id, { values: [value] }).catch((e) => e);
      expect(error.status, field).toBe(400);
      expect(Object.keys(error.fieldErrors), JSON.stringify(error.fieldErrors)).toContain(field);
    }
    expect(await countRows('revision_values')).toBe(before);
  });

  it('nobody publishes or returns their own revision', async () => {
    const id = await inReview(editor, 2.6);
    await expect(publishRevision(editor, id)).rejects.toMatchObject({ status: 403 });
    await expect(returnRevision(editor, id, { comment: 'mine' })).rejects.toMatchObject({
      status: 403,
    });
    expect(await statusOf(id)).toBe('in_review');
    await returnRevision(editor2, id, { comment: 'Cite the storage date.' });
  });

  it('returned → edited → submitted → published; the old revision is superseded and kept', async () => {
    const before = (await getCultivar(engineer, SLUG)).published!;
    const id = await inReview(editor, 2.7);
    await returnRevision(editor2, id, { comment: 'Give the range as well.' });
    expect(await statusOf(id)).toBe('returned');
    await updateDraft(editor, id, { values: [{ ...modulus(2.7), low: 2.36, high: 3.28 }] });
    await submitDraft(editor, id);
    await publishRevision(editor2, id);
    expect(await statusOf(id)).toBe('published');
    expect(await statusOf(before.id)).toBe('superseded');
    const old = await getRevision(engineer, before.id);
    expect(old.values.length).toBeGreaterThan(0);
    const now = await getCultivar(engineer, SLUG);
    expect(now.published!.id).toBe(id);
    expect(now.values[0]).toMatchObject({ value: 2.7, low: 2.36, high: 3.28, unit: 'MPa' });
  });

  it('published and superseded revisions can never be edited, submitted, returned or rebased', async () => {
    const revisions = await listRevisions(editor, SLUG);
    const fixed = revisions.filter((r) => r.status === 'published' || r.status === 'superseded');
    expect(fixed.length).toBeGreaterThanOrEqual(2);
    for (const r of fixed) {
      const rows = await db('revision_values').where({ revision_id: r.id }).orderBy('id');
      const author =
        r.authorId === editor.id ? editor : r.authorId === editor2.id ? editor2 : admin;
      for (const attempt of [
        () => updateDraft(author, r.id, { values: [modulus(9)] }),
        () => submitDraft(author, r.id),
        () => returnRevision(author.id === admin.id ? editor : admin, r.id, { comment: 'again' }),
        () => rebaseDraft(author, r.id),
        () => publishRevision(author.id === admin.id ? editor : admin, r.id),
      ]) {
        await expect(attempt()).rejects.toMatchObject({ status: expect.any(Number) });
      }
      expect(await statusOf(r.id)).toBe(r.status);
      expect(await db('revision_values').where({ revision_id: r.id }).orderBy('id')).toEqual(rows);
    }
  });

  it('publishing over a newer revision is a 409 naming it; after a rebase it publishes', async () => {
    const first = await inReview(editor, 2.8);
    const second = await inReview(editor2, 2.9);
    await publishRevision(admin, first);
    const error = await publishRevision(admin, second).catch((e) => e);
    expect(error.status).toBe(409);
    const firstNumber = (await db('property_revisions').where({ id: first }).first()).number;
    expect(error.message).toContain(`revision ${firstNumber} has been published since`);
    expect(await statusOf(second)).toBe('in_review');
    // Both replaced the same modulus: the rebase holds it as a conflict until editor2 decides.
    expect(await rebaseDraft(editor2, second)).toMatchObject({ conflicts: 1 });
    await expect(submitDraft(editor2, second)).rejects.toMatchObject({ status: 400 });
    const [conflict] = await listConflicts(editor2, second);
    expect([conflict.mine?.value, conflict.theirs?.value]).toEqual([2.9, 2.8]);
    await resolveConflict(editor2, second, { conflictId: conflict.id, choice: 'mine' });
    await submitDraft(editor2, second);
    await publishRevision(editor, second);
    expect((await getCultivar(engineer, SLUG)).published!.id).toBe(second);
    expect(await statusOf(first)).toBe('superseded');
  });

  it('two publishes racing on the same base: exactly one wins, the other gets 409', async () => {
    const a = await inReview(editor, 3.0);
    const b = await inReview(editor2, 3.1);
    const results = await Promise.allSettled([
      publishRevision(admin, a),
      publishRevision(admin, b),
    ]);
    const won = results.filter((r) => r.status === 'fulfilled');
    const lost = results.filter((r) => r.status === 'rejected') as PromiseRejectedResult[];
    expect(won).toHaveLength(1);
    expect(lost).toHaveLength(1);
    expect(lost[0].reason.status).toBe(409);
    const published = await db('property_revisions').where({
      cultivar_id: (await db('cultivars').where({ slug: SLUG }).first()).id,
      status: 'published',
    });
    expect(published).toHaveLength(1);
  });

  it('a follower is e-mailed what changed when a revision is published', async () => {
    await setFollowing(engineer, SLUG, true);
    const id = await inReview(editor, 3.2);
    await publishRevision(editor2, id);
    const mail = await waitForMail(ACCOUNTS.engineer);
    expect(mail.subject).toContain('Jonathan');
    expect(mail.text_body).toMatch(/Young's modulus \(flesh\): .* → 3\.2 MPa/);
    expect(mail.text_body).toContain('/properties/apple-jonathan');
  });

  it('every transition wrote its audit row', async () => {
    const actions = (
      await db('audit_log').where('action', 'like', 'revision.%').select('action')
    ).map((r) => r.action);
    for (const a of [
      'revision.draft',
      'revision.edit',
      'revision.submit',
      'revision.return',
      'revision.publish',
      'revision.rebase',
    ]) {
      expect(actions).toContain(a);
    }
  });

  it('engineers see the published record only; drafts stay with editors', async () => {
    const { id } = await createDraft(editor, SLUG);
    await expect(getRevision(engineer, id)).rejects.toMatchObject({ status: 404 });
    expect(
      (await listRevisions(engineer, SLUG)).every((r) =>
        ['published', 'superseded'].includes(r.status),
      ),
    ).toBe(true);
    await expect(listRevisions(buyer, SLUG)).rejects.toMatchObject({ status: 403 });
  });
});
