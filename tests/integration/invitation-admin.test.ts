import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { linkIn, startTestCatcher, waitForMail } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { auditActions, invitationRow, seedInvitation } from '../support/invitations';
import { db } from '@/lib/db';
import * as invitations from '@/app/api/invitations/route';
import * as one from '@/app/api/invitations/[id]/route';
import * as resend from '@/app/api/invitations/[id]/resend/route';
import * as link from '@/app/(auth)/invite/[token]/route';
import { inviteAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';
import { acceptInvitation, getInvitationState } from '@/lib/data/invitations';
import { GoneError } from '@/lib/errors';

const PASSWORD = 'guest-password-01';
const values = { name: 'Visiting QA', password: PASSWORD, confirmPassword: PASSWORD };
const json = (method: string, body?: unknown) =>
  new Request('http://tenderline.test/api', {
    method,
    headers: { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const params = <T>(p: T) => ({ params: Promise.resolve(p) });
const byId = (id: number) => params({ id: String(id) });
const open = (token: string) =>
  link.GET(new Request(`http://tenderline.test/invite/${token}`), params({ token }));
const form = (values: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, v);
  return f;
};

describe('pending invitations: list, revoke, resend, replace, limit', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  const ids = { admin: 0, editor: 0, editor2: 0 };
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    ids.admin = await userId(ACCOUNTS.admin);
    ids.editor = await userId(ACCOUNTS.editor);
    ids.editor2 = await userId('editor2@kestrelvale.example');
  });
  afterAll(() => catcher.close());

  it('lists open invitations: all for an admin, only their own buyer ones for an editor', async () => {
    const mine = await seedInvitation(ids.editor, 'buyer');
    const other = await seedInvitation(ids.editor2, 'buyer');
    const engineer = await seedInvitation(ids.admin, 'engineer');
    const used = await seedInvitation(ids.editor, 'buyer');
    await db('invitations').where({ id: used.id }).update({ accepted_at: new Date() });

    signInAs(ids.admin);
    const all = (await (await invitations.GET(json('GET'), params({}))).json()).invitations;
    const emails = all.map((i: { email: string }) => i.email);
    expect(emails).toEqual(expect.arrayContaining([mine.email, other.email, engineer.email]));
    expect(emails).not.toContain(used.email);
    const row = all.find((i: { email: string }) => i.email === mine.email);
    expect(row).toMatchObject({
      role: 'buyer',
      inviter: { email: ACCOUNTS.editor },
      expired: false,
    });

    signInAs(ids.editor);
    const own = (await (await invitations.GET(json('GET'), params({}))).json()).invitations;
    expect(own.map((i: { email: string }) => i.email)).toEqual([mine.email]);
  });

  it('revoking ends the link (410, "withdrawn"), is audited, and cannot be repeated', async () => {
    const inv = await seedInvitation(ids.editor, 'buyer');
    signInAs(ids.editor);
    const res = await one.DELETE(
      new Request('http://tenderline.test/api', { method: 'DELETE' }),
      byId(inv.id),
    );
    expect(res.status).toBe(200);
    expect((await res.json()).invitation).toMatchObject({ id: inv.id, state: 'revoked' });
    expect((await invitationRow(inv.id)).revoked_by).toBe(ids.editor);
    expect(await auditActions(inv.id)).toEqual(['invitation.revoke']);

    expect((await getInvitationState(inv.token)).state).toBe('revoked');
    const page = await open(inv.token);
    expect(page.status).toBe(410);
    expect(await page.text()).toContain('withdrawn');
    await expect(acceptInvitation(inv.token, values)).rejects.toBeInstanceOf(GoneError);
    expect(await db('users').where({ email: inv.email }).first()).toBeUndefined();

    const again = await one.DELETE(json('DELETE'), byId(inv.id));
    expect(again.status).toBe(409);
    expect(await auditActions(inv.id)).toEqual(['invitation.revoke']);
  });

  it('resending mails a new link; the old one says it was replaced (410); both audited', async () => {
    const inv = await seedInvitation(ids.admin, 'engineer');
    signInAs(ids.admin);
    const res = await resend.POST(json('POST', {}), byId(inv.id));
    expect(res.status).toBe(201);
    const fresh = (await res.json()).invitation;
    expect(fresh).toMatchObject({ email: inv.email, role: 'engineer', replaced: inv.id });
    const { token } = linkIn((await waitForMail(inv.email)).text_body);
    expect(token).not.toBe(inv.token);

    expect((await invitationRow(inv.id)).replaced_by).toBe(fresh.id);
    const old = await open(inv.token);
    expect(old.status).toBe(410);
    expect(await old.text()).toContain('replaced by a newer one');
    expect(await auditActions(fresh.id)).toEqual(['invitation.resend']);

    const now = await open(token);
    expect(now.status).toBe(303);
    expect(now.headers.get('location')).toBe('/invite/accept');
    expect(now.headers.get('set-cookie')).toMatch(/tl_invite=.*HttpOnly/i);
    await acceptInvitation(token, values);
    expect((await open(token)).status).toBe(410);
    expect((await resend.POST(json('POST', {}), byId(fresh.id))).status).toBe(409);
  });

  it('inviting an address again replaces its open invitation', async () => {
    const email = 'twice@plum-buyer.example';
    signInAs(ids.editor);
    expect((await invitations.POST(json('POST', { email }), params({}))).status).toBe(201);
    const first = linkIn((await waitForMail(email)).text_body).token;
    await db('mail_outbox').where('to_addresses', 'like', `%${email}%`).delete();
    const res = await invitations.POST(json('POST', { email }), params({}));
    expect(res.status).toBe(201);
    const second = (await res.json()).invitation;
    expect(second.replaced).toHaveLength(1);
    const latest = linkIn((await waitForMail(email)).text_body).token;

    expect((await getInvitationState(first)).state).toBe('replaced');
    expect((await getInvitationState(latest)).state).toBe('valid');
    const openRows = await db('invitations').where({ email }).whereNull('replaced_at');
    expect(openRows.map((r) => r.id)).toEqual([second.id]);
    expect(await auditActions(second.id)).toEqual(['invitation.create']);
  });

  it('an editor cannot replace an invitation someone else sent (409), and nothing is stored', async () => {
    const theirs = await seedInvitation(ids.admin, 'engineer');
    const before = await countRows('invitations');
    signInAs(ids.editor);
    const res = await invitations.POST(json('POST', { email: theirs.email }), params({}));
    expect(res.status).toBe(409);
    expect(await countRows('invitations')).toBe(before);
    expect((await getInvitationState(theirs.token)).state).toBe('valid');
  });

  it('an expired link answers 410, an unknown one 404, both in plain words', async () => {
    const lapsed = await seedInvitation(ids.admin, 'buyer', {
      createdAt: new Date(Date.now() - 8 * 24 * 3600e3),
    });
    const expired = await open(lapsed.token);
    expect(expired.status).toBe(410);
    expect(expired.headers.get('content-type')).toMatch(/text\/html/);
    expect(await expired.text()).toContain('has expired');
    const unknown = await open('A'.repeat(43));
    expect(unknown.status).toBe(404);
    expect(await unknown.text()).toContain('not valid');
    expect((await open('x'.repeat(500))).status).toBe(404);
  });

  it('allows 20 invitations an hour per inviter, even when 25 arrive at once', async () => {
    signInAs(ids.editor2);
    const before = await countRows('invitations');
    const sent = await Promise.all(
      Array.from({ length: 25 }, (_, i) =>
        invitations.POST(json('POST', { email: `burst-${i}@berry-buyer.example` }), params({})),
      ),
    );
    const statuses = sent.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(20);
    expect(statuses.filter((s) => s === 429)).toHaveLength(5);
    const refused = sent.find((r) => r.status === 429)!;
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(3000);
    expect((await refused.json()).message).toMatch(/20 invitations in the last hour/);
    expect(await countRows('invitations')).toBe(before + 20);

    // The form shows the same refusal as a message, keeping what was typed.
    const email = 'one-more@berry-buyer.example';
    const state = await inviteAction(initialActionState, form({ email, role: 'buyer' }));
    expect(state).toMatchObject({ ok: false, status: 429, values: { email } });
    expect(state.message).toMatch(/Try again in \d+ min/);

    // Resending counts too; an hour later the inviter may send again.
    const inv = await seedInvitation(ids.editor2, 'buyer');
    expect((await resend.POST(json('POST', {}), byId(inv.id))).status).toBe(429);
    await db('invitations')
      .where({ invited_by: ids.editor2 })
      .update({ created_at: new Date(Date.now() - 3601e3) });
    expect((await resend.POST(json('POST', {}), byId(inv.id))).status).toBe(201);
  });
});
