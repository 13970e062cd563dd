import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { linkIn, startTestCatcher, waitForMail } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import { acceptInvitation, createInvitation, getInvitationState } from '@/lib/data/invitations';
import { getActiveActor, verifyCredentials } from '@/lib/data/users';
import { ConflictError, ForbiddenError, GoneError, ValidationError } from '@/lib/errors';
import * as accept from '@/app/api/invitations/accept/route';
import { acceptInvitationAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';
import type { Actor } from '@/lib/auth/actor';

const PASSWORD = 'buyer-password-01';
const values = { name: 'Visiting QA', password: PASSWORD, confirmPassword: PASSWORD };

describe('invitations over real SMTP on loopback', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  let admin: Actor;
  let editor: Actor;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    editor = (await getActiveActor(await userId(ACCOUNTS.editor)))!;
    signInAs(null);
  });
  afterAll(() => catcher.close());

  it('e-mails a one-time link that creates a buyer once, and only once', async () => {
    const email = 'qa.lead@citrus-buyer.example';
    const inv = await createInvitation(editor, { email, role: 'buyer' });
    expect(inv.expiresAt.getTime() - Date.now()).toBeGreaterThan(6.99 * 24 * 3600e3);

    const mail = await waitForMail(email);
    expect(mail.subject).toContain('invitation');
    const { link, token } = linkIn(mail.text_body);
    expect(link.startsWith('http://tenderline.test/invite/')).toBe(true);
    // Only the hash is stored, never the token.
    const stored = await db('invitations').where({ id: inv.id }).first();
    expect(stored.token_hash).not.toContain(token);
    expect(JSON.stringify(await db('invitations').select())).not.toContain(token);

    expect((await getInvitationState(token)).state).toBe('valid');
    const { userId: newId } = await acceptInvitation(token, values);
    const buyer = await getActiveActor(newId);
    expect(buyer?.role).toBe('buyer');
    expect((await verifyCredentials(email, PASSWORD))?.id).toBe(newId);

    expect((await getInvitationState(token)).state).toBe('used');
    await expect(acceptInvitation(token, values)).rejects.toBeInstanceOf(GoneError);
    const actions = (await db('audit_log').select('action')).map((r) => r.action);
    expect(actions).toEqual(expect.arrayContaining(['invitation.create', 'invitation.accept']));
  });

  it('refuses an expired link with a clear state, and writes nothing', async () => {
    const email = 'late@stone-fruit-buyer.example';
    const inv = await createInvitation(admin, { email, role: 'buyer' });
    const { token } = linkIn((await waitForMail(email)).text_body);
    // Eight days later the link has lapsed (expiry is 7 days).
    expect((await getInvitationState(token, new Date(Date.now() + 8 * 24 * 3600e3))).state).toBe(
      'expired',
    );
    await db('invitations')
      .where({ id: inv.id })
      .update({ expires_at: new Date(Date.now() - 1000) });
    const users = await countRows('users');
    await expect(acceptInvitation(token, values)).rejects.toThrow(/expired/);
    expect(await countRows('users')).toBe(users);
  });

  it('treats a tampered or malformed token as not valid', async () => {
    const email = 'tamper@berry-buyer.example';
    await createInvitation(admin, { email, role: 'buyer' });
    const { token } = linkIn((await waitForMail(email)).text_body);
    const flipped = token.slice(0, -1) + (token.endsWith('A') ? 'B' : 'A');
    expect((await getInvitationState(flipped)).state).toBe('invalid');
    expect((await getInvitationState('short')).state).toBe('invalid');
    expect((await getInvitationState('../../etc/passwd')).state).toBe('invalid');
    await expect(acceptInvitation(flipped, values)).rejects.toBeInstanceOf(ValidationError);
  });

  it('lets editors invite buyers only, and refuses an existing account', async () => {
    await expect(
      createInvitation(editor, { email: 'x@y.example', role: 'engineer' }),
    ).rejects.toBeInstanceOf(ForbiddenError);
    await expect(
      createInvitation(admin, { email: ACCOUNTS.engineer, role: 'buyer' }),
    ).rejects.toBeInstanceOf(ConflictError);
    const engineer = (await getActiveActor(await userId(ACCOUNTS.engineer)))!;
    await expect(createInvitation(engineer, { email: 'z@y.example' })).rejects.toBeInstanceOf(
      ForbiddenError,
    );
  });

  it('spends a token once when two acceptances race', async () => {
    const email = 'race@pome-buyer.example';
    await createInvitation(admin, { email, role: 'buyer' });
    const { token } = linkIn((await waitForMail(email)).text_body);
    const results = await Promise.allSettled([
      acceptInvitation(token, values),
      acceptInvitation(token, values),
    ]);
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    expect(await db('users').where({ email }).count({ n: '*' })).toEqual([{ n: 1 }]);
  });

  it('says an over-long or malformed token is not valid, and a missing one is required', async () => {
    const post = (body: unknown) =>
      accept.POST(
        new Request('http://tenderline.test/api', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify(body),
        }),
        { params: Promise.resolve({}) },
      );
    for (const token of ['x'.repeat(201), 'a'.repeat(5000), 'has spaces and / slashes', 42]) {
      const res = await post({ ...values, token });
      expect(res.status).toBe(400);
      expect((await res.json()).fieldErrors.token).toEqual(['This invitation link is not valid.']);
    }
    const missing = await (await post(values)).json();
    expect(missing.fieldErrors.token).toEqual(['The invitation token is required.']);
  });

  it('answers 410 from the accept API for a used link', async () => {
    const email = 'used-twice@kiwi-buyer.example';
    await createInvitation(admin, { email, role: 'buyer' });
    const { token } = linkIn((await waitForMail(email)).text_body);
    await acceptInvitation(token, values);
    const res = await accept.POST(
      new Request('http://tenderline.test/api', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ ...values, token }),
      }),
      { params: Promise.resolve({}) },
    );
    expect(res.status).toBe(410);
    expect((await res.json()).message).toContain('already been used');
  });

  it('keeps the typed name (never the password) when the accept form reports an error', async () => {
    const email = 'short-password@fig-buyer.example';
    await createInvitation(admin, { email, role: 'buyer' });
    const { token } = linkIn((await waitForMail(email)).text_body);
    const f = new FormData();
    for (const [k, v] of Object.entries({
      token,
      name: 'Ana Ruiz',
      password: 'short',
      confirmPassword: 'short',
    }))
      f.set(k, v);
    const state = await acceptInvitationAction(initialActionState, f);
    expect(state.ok).toBe(false);
    expect(state.fieldErrors?.password?.[0]).toMatch(/at least 10/);
    expect(state.values).toEqual({ name: 'Ana Ruiz' });
    expect(JSON.stringify(state)).not.toContain('short"');
  });
});
