import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import { can, type Capability, type Role } from '@/lib/auth/roles';
import * as me from '@/app/api/me/route';
import * as password from '@/app/api/account/password/route';
import * as users from '@/app/api/admin/users/route';
import * as user from '@/app/api/admin/users/[id]/route';
import * as invitations from '@/app/api/invitations/route';
import * as outbox from '@/app/api/admin/outbox/route';
import * as audit from '@/app/api/admin/audit/route';
import { changePasswordAction } from '@/lib/actions/account';
import { updateUserAction } from '@/lib/actions/users';
import { inviteAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';

type Who = Role | 'signed-out';
const WHO: Who[] = ['signed-out', 'admin', 'editor', 'engineer', 'buyer'];

/**
 * One row per protected route handler or server action: the capability it needs, the status an
 * allowed role gets, and how to call it. Later issues add rows here.
 */
interface Row {
  name: string;
  capability: Capability;
  okStatus: number;
  call: (who: Who) => Promise<number>;
}

const json = (method: string, body?: unknown) =>
  new Request('http://tenderline.test/api', {
    method,
    headers: { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const params = <T>(p: T) => ({ params: Promise.resolve(p) });
const form = (values: Record<string, string>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, v);
  return f;
};
let engineerId = 0;
let n = 0;
const freshEmail = (who: Who) => `matrix-${who}-${++n}@visitor.example`;

const ROWS: Row[] = [
  {
    name: 'GET /api/me',
    capability: 'account:manage-own',
    okStatus: 200,
    call: async () => (await me.GET(json('GET'), params({}))).status,
  },
  {
    name: 'POST /api/account/password',
    capability: 'account:manage-own',
    okStatus: 200,
    call: async () =>
      (
        await password.POST(
          json('POST', {
            currentPassword: DEMO_PASSWORD,
            newPassword: DEMO_PASSWORD,
            confirmPassword: DEMO_PASSWORD,
          }),
          params({}),
        )
      ).status,
  },
  {
    name: 'GET /api/admin/users',
    capability: 'users:manage',
    okStatus: 200,
    call: async () => (await users.GET(json('GET'), params({}))).status,
  },
  {
    name: 'PATCH /api/admin/users/[id]',
    capability: 'users:manage',
    okStatus: 200,
    call: async () =>
      (await user.PATCH(json('PATCH', { role: 'engineer' }), params({ id: String(engineerId) })))
        .status,
  },
  {
    name: 'POST /api/invitations',
    capability: 'invitations:create-buyer',
    okStatus: 201,
    call: async (who) =>
      (await invitations.POST(json('POST', { email: freshEmail(who), role: 'buyer' }), params({})))
        .status,
  },
  {
    name: 'GET /api/admin/outbox',
    capability: 'outbox:read',
    okStatus: 200,
    call: async () => (await outbox.GET(json('GET'), params({}))).status,
  },
  {
    name: 'GET /api/admin/audit',
    capability: 'audit:read',
    okStatus: 200,
    call: async () => (await audit.GET(json('GET'), params({}))).status,
  },
  {
    name: 'action changePasswordAction',
    capability: 'account:manage-own',
    okStatus: 200,
    call: async () =>
      (
        await changePasswordAction(
          initialActionState,
          form({
            currentPassword: DEMO_PASSWORD,
            newPassword: DEMO_PASSWORD,
            confirmPassword: DEMO_PASSWORD,
          }),
        )
      ).status,
  },
  {
    name: 'action updateUserAction',
    capability: 'users:manage',
    okStatus: 200,
    call: async () =>
      (
        await updateUserAction(
          initialActionState,
          form({ userId: String(engineerId), disabled: 'false' }),
        )
      ).status,
  },
  {
    name: 'action inviteAction',
    capability: 'invitations:create-buyer',
    okStatus: 200,
    call: async (who) =>
      (await inviteAction(initialActionState, form({ email: freshEmail(who), role: 'buyer' })))
        .status,
  },
];

describe('role matrix: every protected handler and action answers what the capability table says', () => {
  const ids: Partial<Record<Role, number>> = {};
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  beforeAll(async () => {
    await freshDatabase();
    catcher = await startTestCatcher();
    for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const)
      ids[role] = await userId(ACCOUNTS[role]);
    engineerId = ids.engineer!;
  });
  afterAll(() => catcher.close());

  for (const row of ROWS) {
    for (const who of WHO) {
      const expected = who === 'signed-out' ? 401 : can(who, row.capability) ? row.okStatus : 403;
      it(`${row.name} as ${who} → ${expected}`, async () => {
        signInAs(who === 'signed-out' ? null : ids[who]!);
        expect(await row.call(who)).toBe(expected);
      });
    }
  }

  it('a disabled account is treated as signed out even with a live session', async () => {
    const buyer = ids.buyer!;
    signInAs(ids.admin!);
    expect(
      (await user.PATCH(json('PATCH', { disabled: true }), params({ id: String(buyer) }))).status,
    ).toBe(200);
    signInAs(buyer);
    expect((await me.GET(json('GET'), params({}))).status).toBe(401);
    signInAs(ids.admin!);
    expect(
      (await user.PATCH(json('PATCH', { disabled: false }), params({ id: String(buyer) }))).status,
    ).toBe(200);
    signInAs(buyer);
    expect((await me.GET(json('GET'), params({}))).status).toBe(200);
  });

  it('a role change takes effect on the next request, whatever the session says', async () => {
    signInAs(ids.admin!);
    await user.PATCH(json('PATCH', { role: 'buyer' }), params({ id: String(engineerId) }));
    signInAs(engineerId);
    const body = await (await me.GET(json('GET'), params({}))).json();
    expect(body.user.role).toBe('buyer');
    expect(body.areas).toEqual(['/atlas', '/properties']);
    signInAs(ids.admin!);
    await user.PATCH(json('PATCH', { role: 'engineer' }), params({ id: String(engineerId) }));
  });
});
