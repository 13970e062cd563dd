import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { actionHeaders, signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import { invitationRow, seedInvitation } from '../support/invitations';
import type { Role } from '@/lib/auth/roles';
import * as invitations from '@/app/api/invitations/route';
import * as one from '@/app/api/invitations/[id]/route';
import * as resend from '@/app/api/invitations/[id]/resend/route';
import { resendInvitationAction, revokeInvitationAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';

type Who = Role | 'signed-out';
type Owner = 'editor' | 'editor2' | 'admin';
const ids: Record<Owner | Role, number> = {
  admin: 0,
  editor: 0,
  editor2: 0,
  engineer: 0,
  buyer: 0,
};

const request = (method: string, init: { headers?: Record<string, string>; body?: string } = {}) =>
  new Request('http://tenderline.test/api', {
    method,
    headers: { 'content-type': 'application/json', ...init.headers },
    body: init.body ?? (method === 'POST' ? '{}' : undefined),
  });
const params = (id: number) => ({ params: Promise.resolve({ id: String(id) }) });
const form = (id: number) => {
  const f = new FormData();
  f.set('invitationId', String(id));
  return f;
};

/**
 * Each new route and action against each identity, on a fresh invitation sent by `owner` with
 * `role`. The statuses are written out by hand: admins manage every invitation, an editor only
 * the buyer invitations they sent, engineers and buyers none; signed-out callers get 401.
 */
interface Row {
  name: string;
  owner: Owner;
  role: Role;
  call: (id: number) => Promise<number>;
  expect: Record<Who, number>;
}
const revokeRoute = (id: number) => one.DELETE(request('DELETE'), params(id)).then((r) => r.status);
const resendRoute = (id: number) => resend.POST(request('POST'), params(id)).then((r) => r.status);
const revokeAction = (id: number) =>
  revokeInvitationAction(initialActionState, form(id)).then((s) => s.status);
const resendAction = (id: number) =>
  resendInvitationAction(initialActionState, form(id)).then((s) => s.status);

const ROWS: Row[] = [
  {
    name: 'GET /api/invitations',
    owner: 'editor',
    role: 'buyer',
    call: () =>
      invitations
        .GET(request('GET', { body: undefined }), { params: Promise.resolve({}) })
        .then((r) => r.status),
    expect: { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
  },
  {
    name: "DELETE /api/invitations/[id], editor's buyer invitation",
    owner: 'editor',
    role: 'buyer',
    call: revokeRoute,
    expect: { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
  },
  {
    name: "DELETE /api/invitations/[id], another editor's buyer invitation",
    owner: 'editor2',
    role: 'buyer',
    call: revokeRoute,
    expect: { 'signed-out': 401, admin: 200, editor: 403, engineer: 403, buyer: 403 },
  },
  {
    name: "DELETE /api/invitations/[id], admin's engineer invitation",
    owner: 'admin',
    role: 'engineer',
    call: revokeRoute,
    expect: { 'signed-out': 401, admin: 200, editor: 403, engineer: 403, buyer: 403 },
  },
  {
    name: "POST /api/invitations/[id]/resend, editor's buyer invitation",
    owner: 'editor',
    role: 'buyer',
    call: resendRoute,
    expect: { 'signed-out': 401, admin: 201, editor: 201, engineer: 403, buyer: 403 },
  },
  {
    name: "POST /api/invitations/[id]/resend, another editor's buyer invitation",
    owner: 'editor2',
    role: 'buyer',
    call: resendRoute,
    expect: { 'signed-out': 401, admin: 201, editor: 403, engineer: 403, buyer: 403 },
  },
  {
    name: "POST /api/invitations/[id]/resend, admin's engineer invitation",
    owner: 'admin',
    role: 'engineer',
    call: resendRoute,
    expect: { 'signed-out': 401, admin: 201, editor: 403, engineer: 403, buyer: 403 },
  },
  {
    name: "action revokeInvitationAction, editor's buyer invitation",
    owner: 'editor',
    role: 'buyer',
    call: revokeAction,
    expect: { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
  },
  {
    name: "action revokeInvitationAction, admin's engineer invitation",
    owner: 'admin',
    role: 'engineer',
    call: revokeAction,
    expect: { 'signed-out': 401, admin: 200, editor: 403, engineer: 403, buyer: 403 },
  },
  {
    name: "action resendInvitationAction, editor's buyer invitation",
    owner: 'editor',
    role: 'buyer',
    call: resendAction,
    expect: { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
  },
  {
    name: "action resendInvitationAction, admin's engineer invitation",
    owner: 'admin',
    role: 'engineer',
    call: resendAction,
    expect: { 'signed-out': 401, admin: 200, editor: 403, engineer: 403, buyer: 403 },
  },
];

describe('invitation routes and actions: who gets which status', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    for (const who of ['admin', 'editor', 'engineer', 'buyer'] as const)
      ids[who] = await userId(ACCOUNTS[who]);
    ids.editor2 = await userId('editor2@kestrelvale.example');
  });
  afterAll(() => catcher.close());

  for (const row of ROWS) {
    for (const who of Object.keys(row.expect) as Who[]) {
      const status = row.expect[who];
      it(`${row.name} as ${who} → ${status}`, async () => {
        const inv = await seedInvitation(ids[row.owner], row.role);
        const audits = await countRows('audit_log');
        signInAs(who === 'signed-out' ? null : ids[who]);
        expect(await row.call(inv.id)).toBe(status);
        if (status >= 400) {
          const stored = await invitationRow(inv.id);
          expect([stored.revoked_at, stored.replaced_at]).toEqual([null, null]);
          expect(await countRows('audit_log')).toBe(audits);
        }
      });
    }
  }
});

describe('write guards on the new invitation routes and actions', () => {
  const EVIL = { origin: 'http://evil.example' };
  const TEXT = { 'content-type': 'text/plain' };
  const CASES = [
    {
      name: 'DELETE /api/invitations/[id] from a foreign origin',
      status: 403,
      call: (id: number) => one.DELETE(request('DELETE', { headers: EVIL }), params(id)),
    },
    {
      name: 'DELETE /api/invitations/[id] with a text/plain body',
      status: 415,
      call: (id: number) =>
        one.DELETE(request('DELETE', { headers: TEXT, body: 'revoke' }), params(id)),
    },
    {
      name: 'POST /api/invitations/[id]/resend from a foreign origin',
      status: 403,
      call: (id: number) => resend.POST(request('POST', { headers: EVIL }), params(id)),
    },
    {
      name: 'POST /api/invitations/[id]/resend as text/plain',
      status: 415,
      call: (id: number) => resend.POST(request('POST', { headers: TEXT, body: '{}' }), params(id)),
    },
  ];

  for (const c of CASES) {
    it(`${c.name} → ${c.status}, nothing stored`, async () => {
      signInAs(ids.admin);
      const inv = await seedInvitation(ids.admin, 'buyer');
      const before = [
        await countRows('invitations'),
        await countRows('audit_log'),
        await countRows('mail_outbox'),
      ];
      expect((await c.call(inv.id)).status).toBe(c.status);
      const after = [
        await countRows('invitations'),
        await countRows('audit_log'),
        await countRows('mail_outbox'),
      ];
      expect(after).toEqual(before);
      expect((await invitationRow(inv.id)).revoked_at).toBeNull();
    });
  }

  it('both actions refuse a foreign origin with 403 and change nothing', async () => {
    signInAs(ids.admin);
    const inv = await seedInvitation(ids.admin, 'buyer');
    actionHeaders(EVIL);
    try {
      expect((await revokeInvitationAction(initialActionState, form(inv.id))).status).toBe(403);
      expect((await resendInvitationAction(initialActionState, form(inv.id))).status).toBe(403);
    } finally {
      actionHeaders({});
    }
    const stored = await invitationRow(inv.id);
    expect([stored.revoked_at, stored.replaced_at]).toEqual([null, null]);
  });

  it('a bad id is a 400 with a field message; an unknown one 404', async () => {
    signInAs(ids.admin);
    const bad = await one.DELETE(request('DELETE'), { params: Promise.resolve({ id: '0x1' }) });
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors.id[0]).toMatch(/whole number/);
    expect((await resend.POST(request('POST'), params(999999))).status).toBe(404);
    const state = await revokeInvitationAction(initialActionState, new FormData());
    expect(state).toMatchObject({
      status: 400,
      fieldErrors: { invitationId: [expect.any(String)] },
    });
  });
});
