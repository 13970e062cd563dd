import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import { auditChoices, listAudit } from '@/lib/data/audit-reader';
import { getActiveActor } from '@/lib/data/users';
import { ForbiddenError, ValidationError } from '@/lib/errors';
import * as audit from '@/app/api/admin/audit/route';
import type { Actor } from '@/lib/auth/actor';

const at = (iso: string) => new Date(iso);

describe('the audit log: records by name, filtered by action, person and day', () => {
  let admin: Actor;
  let editor: Actor;
  let revisionId: number;
  let revisionLabel: string;
  beforeAll(async () => {
    await freshDatabase();
    await db('audit_log').delete();
    admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    editor = (await getActiveActor(await userId(ACCOUNTS.editor)))!;
    // A seeded revision of a cultivar (not a commodity record), its name read from the tables.
    const rev = await db('property_revisions as r')
      .join('cultivars as c', 'c.id', 'r.cultivar_id')
      .join('commodities as m', 'm.id', 'c.commodity_id')
      .where('c.is_type', false)
      .first('r.id', 'r.number', 'c.name as cultivar', 'm.name as commodity');
    revisionId = rev.id;
    revisionLabel = `${rev.commodity}, ${rev.cultivar}: revision ${rev.number}`;
    const [invitation] = await db('invitations')
      .insert({
        ...{ email: 'qa@plum-buyer.example', role: 'buyer', token_hash: 'x'.repeat(64) },
        ...{ invited_by: admin.id, created_at: at('2026-12-01T09:00:00Z') },
        expires_at: at('2026-12-08T09:00:00Z'),
      })
      .returning('id');
    const entries = [
      [
        admin.id,
        'invitation.create',
        'invitation',
        invitation.id ?? invitation,
        '2026-12-01T09:00:00Z',
      ],
      [editor.id, 'revision.publish', 'revision', revisionId, '2026-12-02T23:59:00Z'],
      [editor.id, 'revision.submit', 'revision', revisionId, '2026-12-03T00:00:00Z'],
      [admin.id, 'user.update', 'user', editor.id, '2026-12-04T12:00:00Z'],
      [null, 'sign-in.failure', 'sign-in', null, '2026-12-04T13:00:00Z'],
      [admin.id, 'revision.discard', 'revision', 987654, '2026-12-05T08:00:00Z'],
    ] as const;
    for (const [actorId, action, entity, entityId, when] of entries) {
      await db('audit_log').insert({
        ...{
          actor_id: actorId,
          action,
          entity,
          entity_id: entityId == null ? null : String(entityId),
        },
        ...{ detail: action === 'sign-in.failure' ? '{"email":"x@y.example"}' : null },
        created_at: at(when),
      });
    }
  });

  it('names each record, and says when one is gone', async () => {
    const rows = await listAudit(admin);
    const byAction = Object.fromEntries(rows.map((r) => [r.action, r.record]));
    expect(byAction).toEqual({
      'invitation.create': 'invitation of qa@plum-buyer.example as buyer',
      'revision.publish': revisionLabel,
      'revision.submit': revisionLabel,
      'user.update': `${editor.name} (${editor.email})`,
      'sign-in.failure': null,
      'revision.discard': null,
    });
    expect(rows.map((r) => r.actorName)).toEqual([
      admin.name,
      null,
      admin.name,
      editor.name,
      editor.name,
      admin.name,
    ]);
  });

  it('filters by action, by person and by day (both ends whole UTC days)', async () => {
    const actions = async (filter: Record<string, string>) =>
      (await listAudit(admin, filter)).map((r) => r.action);
    expect(await actions({ action: 'revision.publish' })).toEqual(['revision.publish']);
    expect(await actions({ actor: String(editor.id) })).toEqual([
      'revision.submit',
      'revision.publish',
    ]);
    // 2026-12-02 takes 23:59 that day and not 00:00 the next.
    expect(await actions({ from: '2026-12-02', to: '2026-12-02' })).toEqual(['revision.publish']);
    expect(await actions({ from: '2026-12-04' })).toEqual([
      'revision.discard',
      'sign-in.failure',
      'user.update',
    ]);
    expect(await actions({ to: '2026-12-01' })).toEqual(['invitation.create']);
    expect(
      await actions({ actor: String(admin.id), from: '2026-12-04', to: '2026-12-04' }),
    ).toEqual(['user.update']);
    // Empty fields are no filter.
    expect(await actions({ action: '', actor: '', from: '', to: '' })).toHaveLength(6);
  });

  it('offers the actions recorded and the people who appear', async () => {
    const choices = await auditChoices(admin);
    expect(choices.actions).toEqual([
      'invitation.create',
      'revision.discard',
      'revision.publish',
      'revision.submit',
      'sign-in.failure',
      'user.update',
    ]);
    expect(choices.people.map((p) => p.email).sort()).toEqual(
      [ACCOUNTS.admin, ACCOUNTS.editor].sort(),
    );
  });

  it('refuses a bad filter with a message per field', async () => {
    const error = await listAudit(admin, {
      ...{ action: 'DROP TABLE', actor: 'someone', from: '2026-02-30' },
      to: '2025-01-01',
    }).catch((e) => e);
    expect(error).toBeInstanceOf(ValidationError);
    expect(Object.keys(error.fieldErrors).sort()).toEqual(['action', 'actor', 'from']);
    const backwards = await listAudit(admin, { from: '2026-12-05', to: '2026-12-01' }).catch(
      (e) => e,
    );
    expect(backwards.fieldErrors).toEqual({ to: ['The last day is before the first day.'] });
  });

  it('is for admins only, filtered or not', async () => {
    await expect(listAudit(editor, { action: 'user.update' })).rejects.toBeInstanceOf(
      ForbiddenError,
    );
    await expect(auditChoices(editor)).rejects.toBeInstanceOf(ForbiddenError);
  });

  describe('GET /api/admin/audit', () => {
    const get = (query: string) =>
      audit.GET(new Request(`http://tenderline.test/api/admin/audit${query}`), {
        params: Promise.resolve({}),
      });

    it('filters from the query', async () => {
      signInAs(admin.id);
      const res = await get(`?action=revision.submit&actor=${editor.id}`);
      expect(res.status).toBe(200);
      const { entries } = await res.json();
      expect(entries.map((e: { action: string }) => e.action)).toEqual(['revision.submit']);
      expect(entries[0].record).toBe(revisionLabel);
    });

    it('answers a bad filter with 400 naming the field', async () => {
      signInAs(admin.id);
      const res = await get('?from=yesterday');
      expect(res.status).toBe(400);
      expect((await res.json()).fieldErrors).toEqual({
        from: ['Give the first day as 2026-12-01.'],
      });
    });

    it.each([
      ['signed out', null, 401],
      ['an editor', 'editor', 403],
      ['an engineer', 'engineer', 403],
      ['a buyer', 'buyer', 403],
    ] as const)('refuses %s with a filter too (%i)', async (_who, role, status) => {
      signInAs(role ? await userId(ACCOUNTS[role]) : null);
      expect((await get('?action=user.update')).status).toBe(status);
    });
  });
});
