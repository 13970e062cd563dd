import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import '../support/session';
import { freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor, setUnitSystem } from '@/lib/data/users';
import {
  createDraft,
  publishRevision,
  returnRevision,
  submitDraft,
  updateDraft,
} from '@/lib/data/revisions';
import { getWorkflowMail, setWorkflowMail } from '@/lib/data/revision-mail-setting';

const SLUG = 'apple-jonathan';
const EDITOR2 = 'editor2@kestrelvale.example';
let admin: Actor, editor: Actor, editor2: Actor, engineer: Actor, buyer: Actor;

/** Jonathan flesh modulus from the seeded thesis source, as an editor would type it. */
const modulus = (value: number) => ({
  quantity: 'youngs_modulus',
  variant: 'flesh',
  value,
  sourceKey: 'shahabasi-1979',
  method: 'Flesh cylinders in compression',
});

/** Messages to an address whose subject starts with `prefix`, oldest first. */
const mails = (to: string, prefix: string) =>
  db('mail_outbox')
    .where('to_addresses', 'like', `%${to}%`)
    .andWhere('subject', 'like', `${prefix}%`)
    .orderBy('id');

async function submitted(author: Actor, value: number) {
  const { id } = await createDraft(author, SLUG);
  await updateDraft(author, id, { summary: `modulus ${value}`, values: [modulus(value)] });
  await submitDraft(author, id);
  return id;
}

describe('workflow e-mail over real SMTP on loopback', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    const actor = async (email: string) => (await getActiveActor(await userId(email)))!;
    admin = await actor(ACCOUNTS.admin);
    editor = await actor(ACCOUNTS.editor);
    editor2 = await actor(EDITOR2);
    engineer = await actor(ACCOUNTS.engineer);
    buyer = await actor(ACCOUNTS.buyer);
  });
  afterAll(() => catcher.close());

  it('a submit mails every other reviewer (never the author, an engineer or a buyer)', async () => {
    const id = await submitted(editor2, 2.5);
    for (const to of [ACCOUNTS.admin, ACCOUNTS.editor]) {
      const [mail] = await mails(to, 'For review');
      expect(mail.subject).toBe('For review: Apple, Jonathan, revision ' + (await numberOf(id)));
      expect(mail.text_body).toContain('Ilse Brandt has submitted revision');
      expect(mail.text_body).toContain(`http://tenderline.test/editor/revisions/${id}`);
      expect(mail.text_body).toContain('http://tenderline.test/account');
    }
    for (const to of [EDITOR2, ACCOUNTS.engineer, ACCOUNTS.buyer]) {
      expect(await mails(to, 'For review'), to).toHaveLength(0);
    }
  });

  it('figures come in the recipient’s units: psi for a US reader, MPa for an SI one', async () => {
    await setUnitSystem(editor, { unitSystem: 'us' });
    const before = (await mails(ACCOUNTS.editor, 'For review')).length;
    await submitted(editor2, 2);
    const us = (await mails(ACCOUNTS.editor, 'For review'))[before];
    // 2 MPa ÷ 6894.757 Pa/psi (1 lbf/in², NIST SP 811) = 290.08 psi, shown to 4 figures.
    expect(us.text_body).toMatch(/Young's modulus \(flesh\): .*→ 290\.1 psi/);
    expect(us.text_body).not.toMatch(/\bMPa\b/);
    const si = (await mails(ACCOUNTS.admin, 'For review')).at(-1);
    expect(si.text_body).toMatch(/Young's modulus \(flesh\): .*→ 2 MPa/);
    await setUnitSystem(editor, { unitSystem: 'si' });
  });

  it('publish and return mail the author, with the reviewer and the comment', async () => {
    const published = await submitted(editor2, 2.6);
    await publishRevision(admin, published);
    const [pub] = await mails(EDITOR2, 'Published');
    expect(pub.text_body).toContain('Mara Oduya has published your revision');
    expect(pub.text_body).toMatch(/→ 2\.6 MPa/);

    const returned = await submitted(editor2, 2.7);
    await returnRevision(editor, returned, { comment: 'Give the storage time of the fruit.' });
    const [ret] = await mails(EDITOR2, 'Returned to you');
    expect(ret.text_body).toContain('Tomas Reyn has returned your revision');
    expect(ret.text_body).toContain('> Give the storage time of the fruit.');
    expect(ret.text_body).toContain(`/editor/revisions/${returned}`);
  });

  it('a muted user gets none of them; the setting is stored, validated and audited', async () => {
    expect(await getWorkflowMail(editor2)).toBe(true);
    expect(await setWorkflowMail(editor2, { workflowMail: 'off' })).toBe(false);
    expect(await getWorkflowMail(editor2)).toBe(false);
    expect(await setWorkflowMail(admin, { workflowMail: false })).toBe(false);
    for (const bad of [{ workflowMail: 'maybe' }, {}, { workflowMail: 1 }]) {
      const error = await setWorkflowMail(editor2, bad).catch((e) => e);
      expect(error.status, JSON.stringify(bad)).toBe(400);
      expect(Object.keys(error.fieldErrors)).toContain('workflowMail');
    }
    expect(await getWorkflowMail(editor2)).toBe(false);

    const counts = async () =>
      Promise.all([mails(EDITOR2, ''), mails(ACCOUNTS.admin, 'For review')]).then((r) =>
        r.map((x) => x.length),
      );
    const [toAuthor, toAdmin] = await counts();
    const id = await submitted(editor2, 2.8);
    await returnRevision(editor, id, { comment: 'Muted: no mail for this one.' });
    // The editor (mail on) still hears of the submit; the muted author and admin do not.
    expect((await mails(ACCOUNTS.editor, 'For review')).at(-1).text_body).toContain(
      `/editor/revisions/${id}`,
    );
    expect(await counts()).toEqual([toAuthor, toAdmin]);

    await setWorkflowMail(editor2, { workflowMail: 'on' });
    const rows = await db('audit_log').where({ action: 'user.workflow-mail' }).orderBy('id');
    expect(rows.map((r) => JSON.parse(r.detail).workflowMail)).toEqual([false, false, true]);
  });

  it('every role may set only its own switch', async () => {
    for (const actor of [engineer, buyer]) {
      expect(await setWorkflowMail(actor, { workflowMail: 'off' })).toBe(false);
    }
    const stored = await db('users').whereIn('id', [engineer.id, buyer.id, editor.id]);
    expect(stored.map((u) => [u.email, Boolean(u.workflow_mail)]).sort()).toEqual(
      [
        [ACCOUNTS.buyer, false],
        [ACCOUNTS.editor, true],
        [ACCOUNTS.engineer, false],
      ].sort(),
    );
  });
});

async function numberOf(id: number): Promise<number> {
  return (await db('property_revisions').where({ id }).first()).number;
}
