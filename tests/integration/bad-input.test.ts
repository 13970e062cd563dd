import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import * as password from '@/app/api/account/password/route';
import * as user from '@/app/api/admin/users/[id]/route';
import * as invitations from '@/app/api/invitations/route';
import * as accept from '@/app/api/invitations/accept/route';

const raw = (body: string) =>
  new Request('http://tenderline.test/api', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body,
  });
const params = <T>(p: T) => ({ params: Promise.resolve(p) });
const TABLES = ['users', 'invitations', 'audit_log', 'mail_outbox'];

async function snapshot() {
  return Object.fromEntries(
    await Promise.all(TABLES.map(async (t) => [t, await countRows(t)] as const)),
  );
}

interface Case {
  name: string;
  call: () => Promise<Response>;
  field: string;
}

let engineerId = 0;
const CASES: Case[] = [
  {
    name: 'malformed JSON to invitations',
    call: () => invitations.POST(raw('{"email": '), params({})),
    field: '_form',
  },
  { name: 'missing e-mail', call: () => invitations.POST(raw('{}'), params({})), field: 'email' },
  {
    name: 'e-mail of the wrong type',
    call: () => invitations.POST(raw('{"email": 42}'), params({})),
    field: 'email',
  },
  {
    name: 'over-long e-mail',
    call: () =>
      invitations.POST(raw(JSON.stringify({ email: `${'a'.repeat(250)}@x.example` })), params({})),
    field: 'email',
  },
  {
    name: 'not an e-mail',
    call: () => invitations.POST(raw('{"email": "not-an-address"}'), params({})),
    field: 'email',
  },
  {
    name: 'unknown role',
    call: () => invitations.POST(raw('{"email": "a@b.example", "role": "owner"}'), params({})),
    field: 'role',
  },
  {
    name: 'role of the wrong type',
    call: () => user.PATCH(raw('{"role": 3}'), params({ id: String(engineerId) })),
    field: 'role',
  },
  {
    name: 'disabled as a string',
    call: () => user.PATCH(raw('{"disabled": "yes"}'), params({ id: String(engineerId) })),
    field: 'disabled',
  },
  {
    name: 'unknown field in a user change',
    call: () => user.PATCH(raw('{"password_hash": "x"}'), params({ id: String(engineerId) })),
    field: '_form',
  },
  {
    name: 'user id that is not a number',
    call: () => user.PATCH(raw('{"role": "buyer"}'), params({ id: 'abc' })),
    field: 'id',
  },
  {
    name: 'malformed JSON to a user change',
    call: () => user.PATCH(raw('nope'), params({ id: String(engineerId) })),
    field: '_form',
  },
  {
    name: 'short new password',
    call: () =>
      password.POST(
        raw(
          JSON.stringify({ currentPassword: 'x', newPassword: 'short', confirmPassword: 'short' }),
        ),
        params({}),
      ),
    field: 'newPassword',
  },
  {
    name: 'over-long new password',
    call: () =>
      password.POST(
        raw(
          JSON.stringify({
            currentPassword: 'x',
            newPassword: 'p'.repeat(201),
            confirmPassword: 'p'.repeat(201),
          }),
        ),
        params({}),
      ),
    field: 'newPassword',
  },
  {
    name: 'new passwords differ',
    call: () =>
      password.POST(
        raw(
          JSON.stringify({
            currentPassword: 'x',
            newPassword: 'abcdefghijk',
            confirmPassword: 'abcdefghijz',
          }),
        ),
        params({}),
      ),
    field: 'confirmPassword',
  },
  {
    name: 'wrong current password',
    call: () =>
      password.POST(
        raw(
          JSON.stringify({
            currentPassword: 'wrong-one',
            newPassword: 'abcdefghijk',
            confirmPassword: 'abcdefghijk',
          }),
        ),
        params({}),
      ),
    field: 'currentPassword',
  },
  {
    name: 'accept without a token',
    call: () =>
      accept.POST(
        raw(JSON.stringify({ name: 'A', password: 'abcdefghijk', confirmPassword: 'abcdefghijk' })),
        params({}),
      ),
    field: 'token',
  },
  {
    name: 'accept with an over-long name',
    call: () =>
      accept.POST(
        raw(
          JSON.stringify({
            token: 'x'.repeat(43),
            name: 'n'.repeat(101),
            password: 'abcdefghijk',
            confirmPassword: 'abcdefghijk',
          }),
        ),
        params({}),
      ),
    field: 'name',
  },
];

describe('bad input answers 400 with a field message and writes nothing', () => {
  beforeAll(async () => {
    await freshDatabase();
    engineerId = await userId(ACCOUNTS.engineer);
    signInAs(await userId(ACCOUNTS.admin));
  });

  for (const c of CASES) {
    it(c.name, async () => {
      const before = await snapshot();
      const res = await c.call();
      expect(res.status).toBe(400);
      const body = await res.json();
      expect(body.error).toBe('invalid_input');
      expect(body.fieldErrors?.[c.field]?.[0], JSON.stringify(body)).toMatch(/\w/);
      expect(await snapshot()).toEqual(before);
    });
  }

  it('an oversized body is refused with 413', async () => {
    const res = await invitations.POST(
      raw(JSON.stringify({ email: 'a@b.example', pad: 'x'.repeat(300_000) })),
      params({}),
    );
    expect(res.status).toBe(413);
  });
});
