import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, updateDraft } from '@/lib/data/revisions';
import { createSource } from '@/lib/data/revision-sources';
import * as workflowMail from '@/app/api/account/workflow-mail/route';

const good = {
  key: 'kv-lab-2026-pear-plates',
  kind: 'report',
  title: 'Flat-plate bruise trials on Williams pears',
  authors: 'Kestrel Vale quality lab',
  year: '2026',
  url: 'https://lab.example/reports/2026-pear-plates',
  doi: '',
};

const put = (body: unknown) =>
  workflowMail.PUT(
    new Request('http://tenderline.test/api/account/workflow-mail', {
      method: 'PUT',
      headers: { 'content-type': 'application/json', origin: 'http://tenderline.test' },
      body: JSON.stringify(body),
    }),
    {},
  );

describe('an editor adds a source from the draft page', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  let editor: Actor, engineer: Actor, buyer: Actor;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    const actor = async (email: string) => (await getActiveActor(await userId(email)))!;
    editor = await actor(ACCOUNTS.editor);
    engineer = await actor(ACCOUNTS.engineer);
    buyer = await actor(ACCOUNTS.buyer);
  });
  afterAll(() => catcher.close());

  it('stores it once, audits it, and a draft value can cite it at once', async () => {
    const { key } = await createSource(editor, good);
    const row = await db('sources').where({ key }).first();
    expect(row).toMatchObject({ kind: 'report', year: 2026, doi: null, title: good.title });
    const audit = await db('audit_log').where({ action: 'source.create', entity_id: key }).first();
    expect(audit.actor_id).toBe(editor.id);

    const { id } = await createDraft(editor, 'pear-williams');
    await updateDraft(editor, id, {
      values: [{ quantity: 'static_bruise_threshold', value: 120, sourceKey: key }],
    });
    const stored = await db('revision_values').where({ revision_id: id }).first();
    expect(stored.source_id).toBe(row.id);
  });

  it('refuses bad fields with a message beside each, and stores nothing', async () => {
    const before = [await countRows('sources'), await countRows('audit_log')];
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [{ ...good, key: 'Bad Key!' }, 'key', /lower-case letters, digits and dashes/],
      [{ ...good, key: 'kv-lab-2026-pear-plates' }, 'key', /exists already/],
      [{ ...good, key: 'other-1', kind: 'demo' }, 'kind', /what kind of work/],
      [{ ...good, key: 'other-2', title: '' }, 'title', /Give the title/],
      [{ ...good, key: 'other-3', year: '3026' }, 'year', /future/],
      [{ ...good, key: 'other-4', year: 'soon' }, 'year', /must be a number/],
      [{ ...good, key: 'other-5', url: 'javascript:alert(1)' }, 'url', /http:\/\/ or https:\/\//],
      [{ ...good, key: 'other-6', doi: 'not a doi' }, 'doi', /starts with 10\./],
    ];
    for (const [input, field, message] of cases) {
      const error = await createSource(editor, input).catch((e) => e);
      expect(error.status, field).toBe(400);
      expect(error.fieldErrors[field]?.join(' '), field).toMatch(message);
    }
    expect([await countRows('sources'), await countRows('audit_log')]).toEqual(before);
  });

  it('engineers and buyers may not add sources', async () => {
    for (const actor of [engineer, buyer]) {
      await expect(createSource(actor, { ...good, key: 'not-mine' })).rejects.toMatchObject({
        status: 403,
      });
    }
    expect(await db('sources').where({ key: 'not-mine' }).first()).toBeUndefined();
  });

  it('PUT /api/account/workflow-mail: 401 signed out, 400 for a bad value, 200 for a boolean', async () => {
    signInAs(null);
    expect((await put({ workflowMail: false })).status).toBe(401);
    signInAs(editor.id);
    const bad = await put({ workflowMail: 'sometimes' });
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors.workflowMail).toBeDefined();
    const ok = await put({ workflowMail: false });
    expect(ok.status).toBe(200);
    expect(await ok.json()).toEqual({ workflowMail: false });
    const stored = await db('users').where({ id: editor.id }).first();
    expect(Boolean(stored.workflow_mail)).toBe(false);
  });
});
