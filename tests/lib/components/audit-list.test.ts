import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { AuditList } from '@/components/admin/audit-list';
import { actionLabel, describeAudit } from '@/components/admin/audit-words';
import type { AuditRow } from '@/lib/data/audit-reader';

const row = (p: Partial<AuditRow>): AuditRow => ({
  ...{ id: 1, actor: 'admin@kestrelvale.example', actorName: 'Mara Oduya' },
  ...{ action: 'invitation.revoke', entity: 'invitation', entityId: '7' },
  ...{ record: 'invitation of a@b.example as buyer', detail: '{"email":"a@b.example"}' },
  createdAt: '2026-12-02T10:00:00.000Z',
  ...p,
});

describe('audit list', () => {
  it('says so when nothing has been recorded, instead of an empty table', () => {
    const html = renderToStaticMarkup(createElement(AuditList, { entries: [] }));
    expect(html).toContain('data-testid="audit-empty"');
    expect(html).toContain('Nothing has been recorded yet');
  });

  it('says so when nothing matches a filter', () => {
    const html = renderToStaticMarkup(createElement(AuditList, { entries: [], filtered: true }));
    expect(html).toContain('No entry matches this filter.');
  });

  it('labels each field of an entry for narrow screens, in words', () => {
    const html = renderToStaticMarkup(createElement(AuditList, { entries: [row({})] }));
    expect(html).toContain('2026-12-02 10:00 UTC');
    expect(html).toMatch(/Who: <\/span>Mara Oduya/);
    expect(html).toMatch(/Action: <\/span>Withdrew the invitation of a@b.example/);
    expect(html).toMatch(/Record: <\/span>invitation of a@b.example as buyer/);
  });

  it('shows no raw JSON, action keys or internal ids', () => {
    const html = renderToStaticMarkup(
      createElement(AuditList, {
        entries: [
          row({}),
          row({
            ...{ id: 2, action: 'user.update', entity: 'user', entityId: '4242' },
            ...{ record: 'Ana Ruiz (ana@example.test)' },
            detail: '{"before":{"role":"engineer","disabled":false},"change":{"role":"buyer"}}',
          }),
          row({
            id: 3,
            action: 'revision.publish',
            entity: 'revision',
            entityId: '9999',
            record: null,
          }),
        ],
      }),
    );
    expect(html).not.toMatch(/[{}]"|"[a-z]+":/);
    expect(html).not.toContain('invitation.revoke');
    expect(html).not.toContain('4242');
    expect(html).not.toContain('9999');
    expect(html).toContain('Changed the account: role from engineer to buyer');
    expect(html).toContain('a revision no longer in the database');
  });
});

describe('audit entries in words', () => {
  it.each([
    [
      'sign-in.success',
      '{"email":"e@x.example","via":"invitation"}',
      'Signed in on accepting an invitation',
    ],
    [
      'sign-in.failure',
      '{"email":"e@x.example","reason":"wrong-password"}',
      'Sign-in as e@x.example refused (wrong password)',
    ],
    [
      'sign-in.locked',
      '{"email":"e@x.example","limit":"account"}',
      'Sign-in as e@x.example locked after repeated failures',
    ],
    [
      'invitation.create',
      '{"email":"q@b.example","role":"buyer","replaced":[3]}',
      'Invited q@b.example as buyer, replacing an earlier invitation',
    ],
    [
      'user.update',
      '{"before":{"role":"buyer","disabled":false},"change":{"disabled":true}}',
      'Changed the account: disabled the account',
    ],
    ['user.units', '{"unitSystem":"us"}', 'Chose US customary units'],
    [
      'revision.return',
      '{"comment":"Cite the table"}',
      'Returned a revision to its author: “Cite the table”',
    ],
    ['revision.import', '{"imported":4,"values":9}', 'Imported 4 values into a draft'],
    ['revision.publish', '{"supersedes":12}', 'Published'],
  ])('%s → %s', (action, detail, words) => {
    expect(describeAudit(row({ action, detail })).what).toBe(words);
  });

  it('names someone not signed in by the address they tried', () => {
    const entry = row({
      ...{ actor: null, actorName: null, action: 'sign-in.failure', entity: 'sign-in' },
      ...{ entityId: null, record: null },
      detail: '{"email":"who@nowhere.example","reason":"unknown-account"}',
    });
    expect(describeAudit(entry)).toEqual({
      who: 'Not signed in (who@nowhere.example)',
      what: 'Sign-in as who@nowhere.example refused (no such account)',
      record: '—',
    });
  });

  it('puts an action it does not know into words, not its key', () => {
    expect(actionLabel('photo.delete')).toBe('Photo delete');
    expect(actionLabel('cultivar.follow')).toBe('Cultivar followed');
  });

  it('survives a detail that is not JSON', () => {
    expect(describeAudit(row({ action: 'invitation.revoke', detail: 'not json' })).what).toBe(
      'Withdrew an invitation',
    );
  });
});
