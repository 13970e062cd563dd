import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { actionHeaders, signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Role } from '@/lib/auth/roles';
import { initialActionState } from '@/lib/actions/initial-state';
import { setWorkflowMailAction } from '@/lib/actions/workflow-mail';
import * as workflowMail from '@/app/api/account/workflow-mail/route';

type Who = Role | 'signed-out';
const SAME_SITE = { origin: 'http://tenderline.test' };

/** Everyone signed in sets their own switch; signed out is 401 (written out, not from can()). */
const EXPECT: Record<Who, number> = {
  'signed-out': 401,
  buyer: 200,
  engineer: 200,
  editor: 200,
  admin: 200,
};

const put = (body: unknown, origin = SAME_SITE.origin) =>
  workflowMail.PUT(
    new Request('http://tenderline.test/api/account/workflow-mail', {
      method: 'PUT',
      headers: { 'content-type': 'application/json', origin },
      body: JSON.stringify(body),
    }),
    {},
  );
const form = (value: string) => {
  const f = new FormData();
  f.set('workflowMail', value);
  return f;
};

describe('the workflow mail switch by role', () => {
  const ids = {} as Record<Role, number>;
  beforeAll(async () => {
    await freshDatabase();
    for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const)
      ids[role] = await userId(ACCOUNTS[role]);
  });
  afterAll(() => signInAs(null));
  beforeEach(() => actionHeaders(SAME_SITE));

  for (const who of Object.keys(EXPECT) as Who[]) {
    it(`PUT /api/account/workflow-mail and the account action as ${who} → ${EXPECT[who]}`, async () => {
      signInAs(who === 'signed-out' ? null : ids[who]);
      expect((await put({ workflowMail: false })).status).toBe(EXPECT[who]);
      expect((await setWorkflowMailAction(initialActionState, form('off'))).status).toBe(
        EXPECT[who],
      );
      if (who !== 'signed-out') {
        const row = await db('users').where({ id: ids[who] }).first();
        expect(Boolean(row.workflow_mail)).toBe(false);
      }
    });
  }

  it('a foreign Origin is refused and changes nothing', async () => {
    signInAs(ids.editor);
    await db('users').where({ id: ids.editor }).update({ workflow_mail: true });
    expect((await put({ workflowMail: false }, 'http://evil.example')).status).toBe(403);
    actionHeaders({ origin: 'http://evil.example' });
    expect((await setWorkflowMailAction(initialActionState, form('off'))).status).toBe(403);
    const row = await db('users').where({ id: ids.editor }).first();
    expect(Boolean(row.workflow_mail)).toBe(true);
  });

  it('the action answers 400 with a field message for anything but on or off', async () => {
    signInAs(ids.editor);
    const state = await setWorkflowMailAction(initialActionState, form('loud'));
    expect(state.status).toBe(400);
    expect(state.fieldErrors?.workflowMail?.join(' ')).toMatch(/on or off/);
  });
});
