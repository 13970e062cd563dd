import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { actionHeaders, signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS, DEMO_PASSWORD } from '../support/accounts';
import type { Role } from '@/lib/auth/roles';
import * as me from '@/app/api/me/route';
import * as password from '@/app/api/account/password/route';
import * as users from '@/app/api/admin/users/route';
import * as user from '@/app/api/admin/users/[id]/route';
import * as lock from '@/app/api/admin/users/[id]/sign-in-lock/route';
import * as invitations from '@/app/api/invitations/route';
import * as outbox from '@/app/api/admin/outbox/route';
import * as audit from '@/app/api/admin/audit/route';
import * as gradeRules from '@/app/api/grade-rules/route';
import {
  changePasswordAction,
  setUnitSystemAction,
  signOutEverywhereAction,
} from '@/lib/actions/account';
import { clearSignInLockAction, updateUserAction } from '@/lib/actions/users';
import { inviteAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';

type Who = Role | 'signed-out';
type Expect = Record<Who, number>;

const json = (method: string, body?: unknown, headers: Record<string, string> = {}) =>
  new Request('http://tenderline.test/api', {
    method,
    headers: { 'content-type': 'application/json', ...headers },
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
const samePassword = {
  currentPassword: DEMO_PASSWORD,
  newPassword: DEMO_PASSWORD,
  confirmPassword: DEMO_PASSWORD,
};

/**
 * Every protected route handler and server action, with the status each identity must get,
 * written out by hand from the product's role table (admin: everything; editor: all an engineer
 * can plus inviting buyers; engineer: own account, reading, checks; buyer: own account and
 * reading only). Deliberately not computed from lib/auth/roles.ts.
 */
interface Row {
  name: string;
  expect: Expect;
  call: (who: Who, headers?: Record<string, string>) => Promise<number>;
}
const ALL_OK = (ok: number): Expect => ({
  'signed-out': 401,
  admin: ok,
  editor: ok,
  engineer: ok,
  buyer: ok,
});
const ADMIN_ONLY = (ok: number): Expect => ({
  'signed-out': 401,
  admin: ok,
  editor: 403,
  engineer: 403,
  buyer: 403,
});

const ROUTES: Row[] = [
  {
    name: 'GET /api/me',
    expect: ALL_OK(200),
    call: async () => (await me.GET(json('GET'), params({}))).status,
  },
  {
    name: 'POST /api/account/password',
    expect: ALL_OK(200),
    call: async (_w, h) => (await password.POST(json('POST', samePassword, h), params({}))).status,
  },
  {
    name: 'GET /api/admin/users',
    expect: ADMIN_ONLY(200),
    call: async () => (await users.GET(json('GET'), params({}))).status,
  },
  {
    name: 'PATCH /api/admin/users/[id]',
    expect: ADMIN_ONLY(200),
    call: async (_w, h) =>
      (await user.PATCH(json('PATCH', { role: 'engineer' }, h), params({ id: String(engineerId) })))
        .status,
  },
  {
    name: 'DELETE /api/admin/users/[id]/sign-in-lock',
    expect: ADMIN_ONLY(200),
    call: async (_w, h) =>
      (await lock.DELETE(json('DELETE', undefined, h), params({ id: String(engineerId) }))).status,
  },
  {
    name: 'POST /api/invitations',
    expect: { 'signed-out': 401, admin: 201, editor: 201, engineer: 403, buyer: 403 },
    call: async (who, h) =>
      (
        await invitations.POST(
          json('POST', { email: freshEmail(who), role: 'buyer' }, h),
          params({}),
        )
      ).status,
  },
  {
    name: 'GET /api/admin/outbox',
    expect: ADMIN_ONLY(200),
    call: async () => (await outbox.GET(json('GET'), params({}))).status,
  },
  {
    name: 'GET /api/admin/audit',
    expect: ADMIN_ONLY(200),
    call: async () => (await audit.GET(json('GET'), params({}))).status,
  },
  {
    name: 'GET /api/grade-rules',
    expect: { 'signed-out': 401, admin: 200, editor: 200, engineer: 200, buyer: 403 },
    call: async () => (await gradeRules.GET(json('GET'), params({}))).status,
  },
  {
    name: 'POST /api/grade-rules',
    expect: ADMIN_ONLY(201),
    call: async (who, h) =>
      (
        await gradeRules.POST(
          json('POST', { name: `Site rule ${who} ${++n}`, measure: 'diameter', limit: 20 }, h),
          params({}),
        )
      ).status,
  },
];

const ACTIONS: Row[] = [
  {
    name: 'action changePasswordAction',
    expect: ALL_OK(200),
    call: async () => (await changePasswordAction(initialActionState, form(samePassword))).status,
  },
  {
    name: 'action setUnitSystemAction',
    expect: ALL_OK(200),
    call: async () =>
      (await setUnitSystemAction(initialActionState, form({ unitSystem: 'si' }))).status,
  },
  {
    name: 'action signOutEverywhereAction',
    expect: ALL_OK(200),
    call: async () => (await signOutEverywhereAction()).status,
  },
  {
    name: 'action updateUserAction',
    expect: ADMIN_ONLY(200),
    call: async () =>
      (
        await updateUserAction(
          initialActionState,
          form({ userId: String(engineerId), disabled: 'false' }),
        )
      ).status,
  },
  {
    name: 'action clearSignInLockAction',
    expect: ADMIN_ONLY(200),
    call: async () =>
      (await clearSignInLockAction(initialActionState, form({ userId: String(engineerId) })))
        .status,
  },
  {
    name: 'action inviteAction',
    expect: { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
    call: async (who) =>
      (await inviteAction(initialActionState, form({ email: freshEmail(who), role: 'buyer' })))
        .status,
  },
];

const WRITE_ROUTES = ROUTES.filter((r) => !r.name.startsWith('GET'));
const WRITTEN = ['users', 'invitations', 'audit_log', 'mail_outbox'];
const snapshot = () => Promise.all(WRITTEN.map((t) => countRows(t)));

describe('role matrix: every protected handler and action answers what the role table says', () => {
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

  for (const row of [...ROUTES, ...ACTIONS]) {
    for (const who of Object.keys(row.expect) as Who[]) {
      it(`${row.name} as ${who} → ${row.expect[who]}`, async () => {
        actionHeaders({ origin: 'http://tenderline.test' });
        signInAs(who === 'signed-out' ? null : ids[who]!);
        expect(await row.call(who)).toBe(row.expect[who]);
      });
    }
  }

  describe('cross-site writes are refused before the route runs, and store nothing', () => {
    for (const row of WRITE_ROUTES) {
      it(`${row.name} from a foreign Origin → 403`, async () => {
        signInAs(ids.admin!);
        const before = await snapshot();
        expect(await row.call('admin', { origin: 'http://127.0.0.1:4999' })).toBe(403);
        expect(await snapshot()).toEqual(before);
      });
      it(`${row.name} from a same-site page without Origin → 403`, async () => {
        signInAs(ids.admin!);
        expect(await row.call('admin', { 'sec-fetch-site': 'same-site' })).toBe(403);
      });
      it(`${row.name} as text/plain → 415`, async () => {
        signInAs(ids.admin!);
        const before = await snapshot();
        expect(await row.call('admin', { 'content-type': 'text/plain' })).toBe(415);
        expect(await snapshot()).toEqual(before);
      });
    }
    for (const row of ACTIONS) {
      it(`${row.name} from a foreign Origin → 403`, async () => {
        signInAs(ids.admin!);
        actionHeaders({ origin: 'http://127.0.0.1:4999' });
        const before = await snapshot();
        expect(await row.call('admin')).toBe(403);
        expect(await snapshot()).toEqual(before);
        actionHeaders();
      });
    }
  });

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

  it('API answers are never cached', async () => {
    signInAs(ids.engineer!);
    expect((await me.GET(json('GET'), params({}))).headers.get('cache-control')).toBe('no-store');
  });
});
